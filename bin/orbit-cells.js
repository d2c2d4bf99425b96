#!/usr/bin/env node
"use strict";
// orbit-cells: the headless runner's command line (src/runner/cli.ts). The runner is TypeScript
// run through tsx (installed by `npm ci`); the worksheet functions it hosts are the BUILT bundle
// dist/functions.js, the same file Excel loads (`npm run build` writes it).
const path = require("node:path");

let tsx;
try {
  tsx = require("tsx/cjs/api");
} catch {
  process.stderr.write("orbit-cells: the development dependencies are missing; run `npm ci` in the project folder first.\n");
  process.exit(2);
}
tsx.require(path.join(__dirname, "..", "src", "runner", "cli.ts"), __filename).main();
