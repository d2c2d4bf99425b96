import { spawnSync } from "node:child_process";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { resolve } from "node:path";
import { gzipSync } from "node:zlib";

const kb = (n: number) => Number((n / 1024).toFixed(1));
const gz = (code: Buffer) => gzipSync(code, { level: 9 }).length;

/**
 * The ground-geometry core (frames, time scales, TLE, SGP4 through satellite.js, passes) is not
 * yet called from a worksheet family, so the production build leaves it out. This builds the
 * functions bundle once more with webpack (the project's own config, target web, production)
 * with every ground module kept alive, to state what the family will cost once it lands.
 */
const GROUND_MODULES = ["coverage", "fk5", "geodetic", "julian", "linkbudget", "lookangles", "passes", "sidereal", "timescales", "tle", "tlestate"];

function groundBundle(): Buffer | string {
  const out = resolve(process.cwd(), "bench/.out/ground-size");
  mkdirSync(out, { recursive: true });
  const probe = resolve(out, "probe.ts");
  writeFileSync(
    probe,
    GROUND_MODULES.map((m, k) => `import * as m${k} from "../../../src/core/${m}";`).join("\n") +
      `\n(globalThis as Record<string, unknown>).__groundProbe = [${GROUND_MODULES.map((_, k) => `m${k}`).join(", ")}];\n`,
  );
  const config = resolve(out, "webpack.config.cjs");
  writeFileSync(
    config,
    `const base = require(${JSON.stringify(resolve(process.cwd(), "webpack.config.js"))})({}, { mode: "production" })[0];
module.exports = { ...base, entry: { functions: [...base.entry.functions, ${JSON.stringify(probe)}] },
  output: { path: ${JSON.stringify(out)}, filename: "functions.js" }, plugins: [],
  module: { rules: [{ test: /\\.ts$/, exclude: /node_modules/, use: { loader: "ts-loader", options: { transpileOnly: true } } }] } };\n`,
  );
  const run = spawnSync(resolve(process.cwd(), "node_modules/.bin/webpack"), ["--mode", "production", "--config", config], { encoding: "utf8" });
  if (run.status !== 0) return `webpack failed: ${(run.stderr || run.stdout).slice(0, 300)}`;
  return readFileSync(resolve(out, "functions.js"));
}

/** Production bundle size of dist/functions.js, minified (as built) and gzipped, and with the ground core in it (goal <= 80 KB). */
export async function benchSize(): Promise<Record<string, number | string>> {
  const code = readFileSync(resolve(process.cwd(), "dist/functions.js"));
  const ground = groundBundle();
  const result: Record<string, number | string> = {
    "functions.js minified, KB": kb(code.length),
    "functions.js gzipped, KB (goal <= 60)": kb(gz(code)),
  };
  if (typeof ground === "string") result["functions.js with the ground core, gzipped, KB (goal <= 80)"] = ground;
  else {
    result["functions.js with the ground core (satellite.js 6.0.2 included), minified, KB"] = kb(ground.length);
    result["functions.js with the ground core, gzipped, KB (goal <= 80)"] = kb(gz(ground));
  }
  return result;
}
