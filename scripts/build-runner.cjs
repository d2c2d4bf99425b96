// Compiles the headless runner (src/runner/cli.ts and what it imports) into one plain JavaScript
// file, dist/runner/cli.js, with esbuild: `npm run build` runs it after webpack, and the package's
// bin (bin/orbit-cells.js) loads that file, so the command needs neither TypeScript nor tsx at run
// time. The engine and the .xlsx reader stay outside the file (production dependencies). In a
// source checkout the bin calls ensureRunner() first, which compiles again only when a source the
// last build read (listed in dist/runner/inputs.json) is newer than dist/runner/cli.js.
"use strict";
const fs = require("node:fs");
const path = require("node:path");

const OUT = path.join("dist", "runner", "cli.js");
const INPUTS = path.join("dist", "runner", "inputs.json");
const EXTERNAL = ["hyperformula", "exceljs"];

/** Compiles the runner under `root`; writes through a temporary file, so a concurrent reader never sees half a file. */
function buildRunner(root) {
  const esbuild = require("esbuild");
  const result = esbuild.buildSync({
    absWorkingDir: root,
    entryPoints: ["src/runner/cli.ts"],
    bundle: true,
    platform: "node",
    target: "node20",
    format: "cjs",
    outfile: OUT,
    external: EXTERNAL,
    metafile: true,
    write: false,
    logLevel: "warning",
  });
  fs.mkdirSync(path.join(root, "dist", "runner"), { recursive: true });
  const put = (rel, data) => {
    const tmp = path.join(root, `${rel}.${process.pid}.tmp`);
    fs.writeFileSync(tmp, data);
    fs.renameSync(tmp, path.join(root, rel));
  };
  put(INPUTS, JSON.stringify(Object.keys(result.metafile.inputs).sort(), null, 1) + "\n");
  put(OUT, result.outputFiles[0].contents);
}

/** Whether dist/runner/cli.js is missing or older than a source its build read. */
function runnerIsStale(root) {
  const out = path.join(root, OUT);
  if (!fs.existsSync(out) || !fs.existsSync(path.join(root, INPUTS))) return true;
  const built = fs.statSync(out).mtimeMs;
  const inputs = JSON.parse(fs.readFileSync(path.join(root, INPUTS), "utf8"));
  return inputs.some((rel) => {
    const file = path.join(root, rel);
    return !fs.existsSync(file) || fs.statSync(file).mtimeMs > built;
  });
}

/** Compiles when stale; where esbuild is not installed (production dependencies only), keeps an existing build. */
function ensureRunner(root) {
  if (!runnerIsStale(root)) return;
  let haveEsbuild = true;
  try {
    require.resolve("esbuild", { paths: [root] });
  } catch {
    haveEsbuild = false;
  }
  if (!haveEsbuild && fs.existsSync(path.join(root, OUT))) return;
  buildRunner(root);
}

module.exports = { buildRunner, runnerIsStale, ensureRunner };

if (require.main === module) buildRunner(path.resolve(__dirname, ".."));
