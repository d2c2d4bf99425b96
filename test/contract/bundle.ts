import { existsSync } from "node:fs";
import { resolve } from "node:path";
import { loadBundle, type LoadedBundle } from "../../src/runner/host";

/** The built bundle, loaded once per test file through the stand-in runtime. */
export function builtBundle(): LoadedBundle {
  const dist = resolve(__dirname, "../../dist");
  if (!existsSync(`${dist}/functions.js`)) throw new Error("dist/functions.js is missing: run `npm run build` (npm test does it)");
  return loadBundle(dist, { isolated: true });
}

/** Wraps values the way Excel passes them to `any[][]` parameters: a single value as [[v]]. */
export const excelArg = (v: unknown): unknown => (v === null || v === undefined ? null : Array.isArray(v) ? v : [[v]]);
