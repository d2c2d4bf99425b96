// `npm run pack:check` (a CI step): builds dist/ and packs the package as `npm pack` does (its
// prepack script builds too), installs the tarball into an empty temporary folder with production
// dependencies only (`npm install --omit=dev`), and runs the installed command there:
// `npx orbit-cells --version`, `eval` and `demo`. Fails on any error, on a missing file in the
// tarball, and on an EBADENGINE warning from the install (the package must install cleanly on
// the Node version the README names). Prints the tarball's size.
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";

const root = resolve(import.meta.dirname ?? new URL(".", import.meta.url).pathname, "..");
const work = mkdtempSync(join(tmpdir(), "orbit-cells-pack-"));
const npm = process.platform === "win32" ? "npm.cmd" : "npm";
const npx = process.platform === "win32" ? "npx.cmd" : "npx";
let failures = 0;

function run(cmd, args, cwd) {
  const r = spawnSync(cmd, args, { cwd, encoding: "utf8", env: { ...process.env, FORCE_COLOR: "0", npm_config_update_notifier: "false" } });
  return { code: r.status, out: r.stdout ?? "", err: r.stderr ?? "" };
}

function check(ok, what, detail = "") {
  console.log(`${ok ? "ok  " : "FAIL"} ${what}${!ok && detail ? `\n${detail}` : ""}`);
  if (!ok) failures++;
}

try {
  // The build prepack would run, first and apart, so that npm pack's own output is only its JSON.
  const build = run(npm, ["run", "build"], root);
  check(build.code === 0, "npm run build", build.err);
  const pack = run(npm, ["pack", "--json", "--ignore-scripts", "--pack-destination", work], root);
  check(pack.code === 0, "npm pack", pack.err);
  if (build.code !== 0 || pack.code !== 0) process.exit(1);
  const info = JSON.parse(pack.out)[0];
  const tarball = join(work, info.filename);
  const files = info.files.map((f) => f.path);
  for (const f of ["package.json", "bin/orbit-cells.js", "dist/functions.js", "dist/functions.json", "dist/runner/cli.js"]) check(files.includes(f), `tarball holds ${f}`);
  check(!files.some((f) => f.startsWith("src/") || f.startsWith("test/")), "tarball holds no sources or tests", files.join("\n"));
  console.log(`     tarball ${info.filename}: ${(info.size / 1024).toFixed(1)} KB packed, ${(info.unpackedSize / 1024).toFixed(1)} KB unpacked, ${files.length} files`);

  const home = join(work, "empty");
  spawnSync(process.execPath, ["-e", `require("fs").mkdirSync(${JSON.stringify(home)})`]);
  const install = run(npm, ["install", "--omit=dev", "--no-audit", "--no-fund", tarball], home);
  check(install.code === 0, "npm install --omit=dev <tarball> in an empty folder", install.err);
  check(!/EBADENGINE/.test(install.out + install.err), `no EBADENGINE warning on Node ${process.version}`, install.err);

  const version = JSON.parse(readFileSync(join(root, "package.json"), "utf8")).version;
  const v = run(npx, ["--no-install", "orbit-cells", "--version"], home);
  check(v.code === 0 && v.out === `orbit-cells ${version}\n`, "npx orbit-cells --version", v.out + v.err);
  const e = run(npx, ["--no-install", "orbit-cells", "eval", '=ORBIT.ORBITAL_SPEED("Earth", 6898)'], home);
  check(e.code === 0 && /^7\.6\d+\n$/.test(e.out), "npx orbit-cells eval", e.out + e.err);
  const d = run(npx, ["--no-install", "orbit-cells", "demo", "--out", "demo"], home);
  const demoFiles = ["skerry-budget.xlsx", "skerry-altitude-sweep.xlsx", "skerry-handout.xlsx", "skerry-l-lunar.xlsx", "skerry-l-mars-window.xlsx"];
  const wrote = demoFiles.every((f) => existsSync(join(home, "demo", f)) && d.out.includes(`${f}: `));
  check(d.code === 0 && d.err === "" && wrote && !/skipped/.test(d.out), "npx orbit-cells demo", d.out.slice(-2000) + d.err);
} finally {
  rmSync(work, { recursive: true, force: true });
}
console.log(failures === 0 ? "package check passed" : `package check: ${failures} failed`);
process.exit(failures === 0 ? 0 : 1);
