// `npm run bench`: bundle bench/run.ts with esbuild (scope-hoisted like the webpack bundle, so the
// timings see the same code shape Excel runs), build the add-in if needed, and run it.
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync } from "node:fs";

if (!existsSync("dist/functions.js") || process.argv.includes("--build")) {
  const b = spawnSync("node_modules/.bin/webpack", ["--mode", "production"], { stdio: ["ignore", "ignore", "inherit"] });
  if (b.status !== 0) process.exit(b.status ?? 1);
}
mkdirSync("bench/.out", { recursive: true });
const esb = spawnSync("node_modules/.bin/esbuild", ["bench/run.ts", "--bundle", "--platform=node", "--target=node20", "--outfile=bench/.out/run.cjs", "--log-level=warning"], { stdio: "inherit" });
if (esb.status !== 0) process.exit(esb.status ?? 1);
const run = spawnSync(process.execPath, ["bench/.out/run.cjs", ...process.argv.slice(2).filter((a) => a !== "--build")], { stdio: "inherit" });
process.exit(run.status ?? 1);
