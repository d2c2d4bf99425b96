/**
 * The function guide: every worksheet function of functions.json (generated from the JSDoc, the
 * single source of names and help), with a worked example formula from examples.ts. Pure.
 */
import { EXAMPLES, exampleFormula, type ExampleArg } from "../functions/examples";

/** The part of a functions.json entry the guide shows. */
export interface FunctionInfo {
  id: string;
  description?: string;
  parameters: { name: string; description?: string; optional?: boolean }[];
}

export interface GuideEntry {
  id: string;
  description: string;
  parameters: { name: string; description: string; optional: boolean }[];
  /** e.g. "ORBITAL_SPEED(body, radius, [sma])" */
  signature: string;
  /** A formula ready for a cell, or null when the function has no worked example. */
  example: string | null;
}

/** Guide entries in functions.json order. */
export function guideEntries(functions: readonly FunctionInfo[], examples: Record<string, ExampleArg[]> = EXAMPLES): GuideEntry[] {
  return functions.map((f) => {
    const parameters = f.parameters.map((p) => ({ name: p.name, description: p.description ?? "", optional: p.optional === true }));
    const args = parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ");
    const ex = examples[f.id];
    return { id: f.id, description: f.description ?? "", parameters, signature: `${f.id}(${args})`, example: ex ? exampleFormula(f.id, ex) : null };
  });
}

/**
 * Entries matching every word of the query (case-insensitive) in the id (underscores read as
 * spaces), description or parameter names and help; ids that start with the query come first,
 * then ids holding every word, then the rest, each in functions.json order.
 */
export function searchGuide(entries: readonly GuideEntry[], query: string): GuideEntry[] {
  const words = query.toLowerCase().split(/\s+/).filter((w) => w !== "");
  if (words.length === 0) return [...entries];
  const text = (e: GuideEntry) =>
    [e.id, e.id.replace(/_/g, " "), e.description, ...e.parameters.flatMap((p) => [p.name, p.description])].join(" ").toLowerCase();
  const hits = entries.filter((e) => {
    const t = text(e);
    return words.every((w) => t.includes(w));
  });
  // Rank: the id starts with the query, then the id holds every word, then the rest.
  const q = query.trim().toUpperCase().replace(/\s+/g, "_");
  const rank = (e: GuideEntry) => (e.id.startsWith(q) ? 0 : words.every((w) => e.id.toLowerCase().includes(w.replace(/\s+/g, "_"))) ? 1 : 2);
  return hits.map((e, i) => ({ e, i, r: rank(e) })).sort((a, b) => a.r - b.r || a.i - b.i).map((x) => x.e);
}

/**
 * A description split after its first sentence (a full stop, then a capital; abbreviations such
 * as "e.g." do not end one): the collapsed line, and the rest for the open entry.
 */
export function splitFirstSentence(s: string): [string, string] {
  const re = /[.!?]\s+(?=[A-Z])/g;
  for (let m = re.exec(s); m; m = re.exec(s)) {
    const before = s.slice(0, m.index + 1);
    if (/\b(e\.g|i\.e|cf|vs|approx|etc)\.$/i.test(before)) continue;
    return [before, s.slice(m.index + m[0].length)];
  }
  return [s, ""];
}
