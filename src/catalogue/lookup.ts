import { badArgument, type Result } from "../core/domain";
import { BODIES } from "./bodies";
import type { Body } from "./types";

const byName = new Map<string, Body>();
for (const b of BODIES) {
  byName.set(b.name.toLowerCase(), b);
  for (const a of b.aliases ?? []) byName.set(a.toLowerCase(), b);
}

/** Levenshtein distance, for suggesting close names on a typo. */
function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diag = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const up = row[j];
      row[j] = Math.min(row[j] + 1, row[j - 1] + 1, diag + (a[i - 1] === b[j - 1] ? 0 : 1));
      diag = up;
    }
  }
  return row[b.length];
}

/** Up to `count` catalogue names closest to `name` (prefix matches first, then edit distance). */
export function closeNames(name: string, count = 3): string[] {
  const q = name.trim().toLowerCase();
  return BODIES.map((b) => {
    const n = b.name.toLowerCase();
    const d = n.startsWith(q) || q.startsWith(n) ? 0 : editDistance(q, n);
    return { name: b.name, d };
  })
    .sort((x, y) => x.d - y.d || x.name.localeCompare(y.name))
    .slice(0, count)
    .map((x) => x.name);
}

/** Case-insensitive lookup by name or alias; an unknown name is a bad argument listing close names. */
export function findBody(name: string, parameter = "body"): Result<Body> {
  const found = byName.get(name.trim().toLowerCase());
  if (found) return found;
  return badArgument(parameter, name, `a catalogue body name such as ${closeNames(name).join(", ")}, or a GM in km3/s2`);
}

/** Every catalogue body name in catalogue order (the default row list of a body table). */
export const bodyNames = (): string[] => BODIES.map((b) => b.name);
