// `npm test`: type-check every TypeScript file (tsc --noEmit), lint every file (eslint), build the
// bundle the contract tests load, run vitest, then print the plain closing line
// "N passed, N failed" (vitest's tests from its JSON report, plus one failure each for a type
// check or lint that fails) and exit non-zero when anything failed.
// `npm test -- --no-build` skips the build; other arguments go to vitest.
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync, rmSync } from "node:fs";

const args = process.argv.slice(2);
const noBuild = args.includes("--no-build");
const vitestArgs = args.filter((a) => a !== "--no-build");
const bin = (name) => `node_modules/.bin/${name}`;

// Static checks first: each counts as one failed test when it fails, and the run goes on so the
// report shows everything at once.
let staticFailures = 0;
for (const [name, cmd, cmdArgs] of [
  ["Type check (tsc --noEmit)", bin("tsc"), ["--noEmit", "-p", "tsconfig.json"]],
  ["Lint (eslint)", bin("eslint"), ["."]],
]) {
  const r = spawnSync(cmd, cmdArgs, { stdio: "inherit" });
  if (r.status !== 0) {
    console.error(`${name} failed.`);
    staticFailures++;
  }
}

if (!noBuild) {
  // The same build as `npm run build`: the add-in, then the runner compiled to dist/runner/.
  let build = spawnSync(bin("webpack"), ["--mode", "production"], { stdio: ["ignore", "ignore", "inherit"] });
  if (build.status === 0) build = spawnSync(process.execPath, ["scripts/build-runner.cjs"], { stdio: ["ignore", "ignore", "inherit"] });
  if (build.status !== 0) {
    console.error("Build failed; run `npm run build` to see why.");
    console.log(`0 passed, ${1 + staticFailures} failed`);
    process.exit(build.status ?? 1);
  }
}

const report = ".vitest-report.json";
rmSync(report, { force: true });
const run = spawnSync(bin("vitest"), ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${report}`, ...vitestArgs], { stdio: "inherit" });
let passed = 0;
let failed = 0;
if (existsSync(report)) {
  const r = JSON.parse(readFileSync(report, "utf8"));
  passed = r.numPassedTests ?? 0;
  failed = r.numFailedTests ?? 0;
  // A suite that fails to load has no tests to count; count it as a failure so it cannot pass silently.
  const brokenSuites = (r.testResults ?? []).filter((s) => s.status === "failed" && (s.assertionResults ?? []).length === 0).length;
  failed += brokenSuites;
}
const code = run.status ?? 1;
if (code !== 0 && failed === 0) failed = 1;
failed += staticFailures;
console.log(`${passed} passed, ${failed} failed`);
process.exit(code !== 0 ? code : staticFailures > 0 ? 1 : 0);
