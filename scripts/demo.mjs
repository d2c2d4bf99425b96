// `npm run demo`: builds the functions bundle (the same dist/functions.js Excel loads), then runs
// `orbit-cells demo`, which writes the Skerry demo workbooks into examples/, recalculates them
// without Excel and prints the key results. `npm run demo -- --no-build` skips the build.
import { spawnSync } from "node:child_process";

const args = process.argv.slice(2);
if (!args.includes("--no-build")) {
  process.stdout.write("Building the worksheet functions (webpack)...\n");
  const build = spawnSync("node_modules/.bin/webpack", ["--mode", "production"], { stdio: ["ignore", "ignore", "inherit"] });
  if (build.status !== 0) {
    console.error("The build failed; run `npm run build` to see why.");
    process.exit(build.status ?? 1);
  }
}
const demo = spawnSync(process.execPath, ["bin/orbit-cells.js", "demo", ...args.filter((a) => a !== "--no-build")], { stdio: "inherit" });
process.exit(demo.status ?? 1);
