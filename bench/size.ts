import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { gzipSync } from "node:zlib";

/** Production bundle size of dist/functions.js, minified (as built) and gzipped (goal <= 60 KB). */
export async function benchSize(): Promise<Record<string, number | string>> {
  const code = readFileSync(resolve(process.cwd(), "dist/functions.js"));
  return {
    "functions.js minified, KB": Number((code.length / 1024).toFixed(1)),
    "functions.js gzipped, KB (goal <= 60)": Number((gzipSync(code, { level: 9 }).length / 1024).toFixed(1)),
  };
}
