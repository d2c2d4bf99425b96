import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { gzipSync } from "node:zlib";

const kb = (n: number) => Number((n / 1024).toFixed(1));
const gz = (code: Buffer) => gzipSync(code, { level: 9 }).length;

/**
 * Production bundle size of dist/functions.js (as `npm run build` writes it), minified and
 * gzipped. It holds every family, the ground families with SGP4 through satellite.js 6.0.2
 * included; goal <= 80 KB gzipped.
 */
export async function benchSize(): Promise<Record<string, number | string>> {
  const code = readFileSync(resolve(process.cwd(), "dist/functions.js"));
  return {
    "functions.js minified, KB": kb(code.length),
    "functions.js gzipped, KB (goal <= 80)": kb(gz(code)),
  };
}

// Run alone (npx tsx bench/size.ts); bundled into bench/run.ts this module is not the entry.
if (process.argv[1] && /bench[\\/]size\.ts$/.test(process.argv[1])) benchSize().then((r) => console.log(r));
