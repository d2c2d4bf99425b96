#!/usr/bin/env node
"use strict";
// orbit-cells: the headless runner's command line. It runs the compiled runner,
// dist/runner/cli.js (built from src/runner by `npm run build`), which hosts the BUILT worksheet
// functions dist/functions.js, the same file Excel loads. In a source checkout the runner is
// compiled again first when its sources have changed (scripts/build-runner.cjs).
const fs = require("node:fs");
const path = require("node:path");

const root = path.join(__dirname, "..");
const compiled = path.join(root, "dist", "runner", "cli.js");

if (fs.existsSync(path.join(root, "src", "runner", "cli.ts")) && fs.existsSync(path.join(root, "scripts", "build-runner.cjs"))) {
  try {
    require(path.join(root, "scripts", "build-runner.cjs")).ensureRunner(root);
  } catch (e) {
    process.stderr.write(`orbit-cells: could not compile the runner from src/runner: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(2);
  }
}
if (!fs.existsSync(compiled)) {
  process.stderr.write("orbit-cells: the runner is not built (dist/runner/cli.js is missing): run `npm run build` in the project folder.\n");
  process.exit(2);
}
require(compiled).main();
