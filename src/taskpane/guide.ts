/**
 * The function guide: every worksheet function of functions.json (generated from the JSDoc, the
 * single source of names and help), with the worked example and search terms each function
 * declares beside its JSDoc (src/functions/define.ts), read from the registry the functions bundle
 * publishes in the same page (the pane and the functions share one runtime). Pure.
 */
import type { FunctionSpec } from "../functions/registry";
import { exampleFormula } from "../functions/examples";

/** What the guide reads of each declaration. */
export type GuideSpec = Pick<FunctionSpec, "example" | "terms" | "family">;

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
  /** Search terms and trade synonyms besides the name. */
  terms: readonly string[];
  /** The family heading it is listed under. */
  family: string;
}

/** Guide entries in functions.json order. */
export function guideEntries(functions: readonly FunctionInfo[], specs: ReadonlyMap<string, GuideSpec>): GuideEntry[] {
  return functions.map((f) => {
    const parameters = f.parameters.map((p) => ({ name: p.name, description: p.description ?? "", optional: p.optional === true }));
    const args = parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ");
    const spec = specs.get(f.id);
    return {
      id: f.id,
      description: f.description ?? "",
      parameters,
      signature: `${f.id}(${args})`,
      example: spec ? exampleFormula(f.id, spec.example) : null,
      terms: spec?.terms ?? [],
      family: spec?.family ?? "",
    };
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
    [e.id, e.id.replace(/_/g, " "), ...e.terms, e.description, ...e.parameters.flatMap((p) => [p.name, p.description])].join(" ").toLowerCase();
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
