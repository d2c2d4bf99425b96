/**
 * The function guide: every worksheet function of functions.json (generated from the JSDoc, the
 * single source of names and help), with the worked example and search terms each function
 * declares beside its JSDoc (src/functions/define.ts), read from the registry the functions bundle
 * publishes in the same page (the pane and the functions share one runtime). Pure.
 */
import type { FunctionSpec } from "../functions/registry";
import { exampleFormula } from "../functions/examples";

/** What the guide reads of each declaration. */
export type GuideSpec = Pick<FunctionSpec, "example" | "terms" | "family" | "labels" | "roles"> & Partial<Pick<FunctionSpec, "run">>;

/** The part of a functions.json entry the guide shows (and the @returns text the build adds). */
export interface FunctionInfo {
  id: string;
  description?: string;
  returns?: string;
  parameters: { name: string; description?: string; optional?: boolean }[];
}

export interface GuideEntry {
  id: string;
  description: string;
  /** What it returns, with units (the JSDoc @returns text). */
  returns: string;
  parameters: { name: string; description: string; optional: boolean }[];
  /** e.g. "ORBITAL_SPEED(body, radius, [sma])" */
  signature: string;
  /** A formula ready for a cell, or null when the function has no worked example. */
  example: string | null;
  /** Rows and columns the example spills to, or null when unknown. */
  spill: { rows: number; cols: number } | null;
  /** Column labels of a function with several values per case. */
  columns: readonly string[];
  /** Search terms and trade synonyms besides the name. */
  terms: readonly string[];
  /** The family heading it is listed under. */
  family: string;
}

/** An example argument as Excel hands it to the function (a single value as a 1x1 matrix). */
const asArg = (v: unknown): unknown => (v === null || v === undefined ? null : Array.isArray(v) ? v : [[v]]);

/** The shape the declaration's example gives, found by calling it once. */
function spillOf(spec: GuideSpec, parameters: number): { rows: number; cols: number } | null {
  if (!spec.run) return null;
  try {
    const out = spec.run(Array.from({ length: parameters }, (_, k) => asArg(spec.example[k] ?? null)));
    const cols = out.reduce((w, r) => Math.max(w, r.length), 0);
    return out.length > 0 && cols > 0 ? { rows: out.length, cols } : null;
  } catch {
    return null;
  }
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
      returns: f.returns ?? "",
      parameters,
      signature: `${f.id}(${args})`,
      example: spec ? exampleFormula(f.id, spec.example, spec.roles) : null,
      spill: spec ? spillOf(spec, parameters.length) : null,
      columns: spec?.labels ?? [],
      terms: spec?.terms ?? [],
      family: spec?.family ?? "",
    };
  });
}

/** Lower-case words of a text: letters and digits, with hyphens, slashes and underscores as breaks. */
const words = (s: string): string[] => s.toLowerCase().split(/[^a-z0-9\u00c0-\u024f∞²³]+/).filter((w) => w !== "");

/** The query as one phrase: its words joined by single spaces. */
const phrase = (s: string): string => words(s).join(" ");

/** Every query word starts a word of the text (so "dv" finds "dv" but not "advance"). */
const allStart = (query: readonly string[], text: readonly string[]): boolean => query.every((q) => text.some((w) => w.startsWith(q)));

/**
 * Entries matching the query, best first. Every query word must start a word of the entry (its
 * id read as words, its search terms, its description, what it returns, its parameters); words
 * inside other words do not count. Ranked: the id itself, then an exact search term (a trade
 * synonym such as "SSO" or "porkchop"), then every word in the id, then every word in the terms,
 * then the rest; each rank in functions.json order.
 */
export function searchGuide(entries: readonly GuideEntry[], query: string): GuideEntry[] {
  const q = words(query);
  if (q.length === 0) return [...entries];
  const whole = q.join(" ");
  const ranked: { e: GuideEntry; i: number; r: number }[] = [];
  entries.forEach((e, i) => {
    const idWords = words(e.id);
    const termWords = e.terms.flatMap(words);
    const text = [...idWords, ...termWords, ...words(e.description), ...words(e.returns), ...e.parameters.flatMap((p) => [...words(p.name), ...words(p.description)])];
    if (!allStart(q, text)) return;
    const r =
      idWords.join(" ") === whole ? 0 : e.terms.some((t) => phrase(t) === whole) ? 1 : allStart(q, idWords) ? 2 : allStart(q, termWords) ? 3 : 4;
    ranked.push({ e, i, r });
  });
  return ranked.sort((a, b) => a.r - b.r || a.i - b.i).map((x) => x.e);
}

/** Entries grouped under their family headings, families in order of first appearance. */
export function byFamily(entries: readonly GuideEntry[]): { family: string; entries: GuideEntry[] }[] {
  const groups = new Map<string, GuideEntry[]>();
  for (const e of entries) {
    const list = groups.get(e.family) ?? [];
    list.push(e);
    groups.set(e.family, list);
  }
  return [...groups].map(([family, list]) => ({ family, entries: list }));
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
