// `npm run demo`: builds the functions bundle (the same dist/functions.js Excel loads) and the
// runner (dist/runner/cli.js) when their sources are newer than dist/, then runs `orbit-cells
// demo`, which writes the Skerry demo workbooks into examples/, recalculates them without Excel
// and prints the key results. `npm run demo -- --no-build` never builds.
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, statSync, utimesSync } from "node:fs";
import { join } from "node:path";
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);
const args = process.argv.slice(2);

/** Newest modification time under the given files and folders (0 when none exist). */
function newest(paths) {
  let t = 0;
  for (const p of paths) {
    if (!existsSync(p)) continue;
    const s = statSync(p);
    if (s.isDirectory()) t = Math.max(t, newest(readdirSync(p).map((f) => join(p, f))));
    else t = Math.max(t, s.mtimeMs);
  }
  return t;
}

// What webpack reads for the functions bundle and its metadata.
const FUNCTION_SOURCES = ["src/core", "src/catalogue", "src/functions", "webpack.config.js", "scripts/reference.cjs", "manifest.xml", "assets", "package-lock.json"];
const built = ["dist/functions.js", "dist/functions.json"].every((f) => existsSync(f)) ? Math.min(statSync("dist/functions.js").mtimeMs, statSync("dist/functions.json").mtimeMs) : 0;

if (!args.includes("--no-build")) {
  if (built === 0 || newest(FUNCTION_SOURCES) > built) {
    process.stdout.write("Building the worksheet functions (webpack)...\n");
    const build = spawnSync("node_modules/.bin/webpack", ["--mode", "production"], { stdio: ["ignore", "ignore", "inherit"] });
    if (build.status !== 0) {
      console.error("The build failed; run `npm run build` to see why.");
      process.exit(build.status ?? 1);
    }
    // webpack leaves an unchanged file untouched; mark the bundle as built now.
    const now = new Date();
    for (const f of ["dist/functions.js", "dist/functions.json"]) utimesSync(f, now, now);
  }
  require("./build-runner.cjs").ensureRunner(process.cwd());
}
const demo = spawnSync(process.execPath, ["bin/orbit-cells.js", "demo", ...args.filter((a) => a !== "--no-build")], { stdio: "inherit" });
process.exit(demo.status ?? 1);
