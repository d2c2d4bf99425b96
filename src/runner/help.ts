import { NAMESPACE, typedName } from "../formula/namespace";
import type { FunctionMetadata, LoadedBundle } from "./host";

/**
 * `orbit-cells list` and `orbit-cells help FUNCTION`: the functions of the built bundle as
 * functions.json describes them (generated from each function's JSDoc: the one source of names,
 * parameters, units and help text), with the worked example the bundle gives for each.
 */

/** "ORBITAL_SPEED(body, radius, [sma])": optional parameters in brackets. */
export const signature = (m: FunctionMetadata): string => `${m.id}(${m.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ")})`;

/** The first sentence of a description (a full stop and a space before a capital; "e.g." and "i.e." end none). */
export function firstSentence(s: string): string {
  const m = /^.*?(?<!\b(?:e\.g|i\.e|cf|vs|approx|etc))[.!?](?=\s+[A-Z])/s.exec(s);
  return m ? m[0] : s;
}

/** Every function, one line each: signature and the first sentence of its description. */
export function listLines(bundle: LoadedBundle): string[] {
  const sigs = bundle.metadata.map(signature);
  const width = Math.min(48, Math.max(...sigs.map((s) => s.length)));
  return bundle.metadata.map((m, k) => `${sigs[k].padEnd(width)}  ${firstSentence(m.description ?? "")}`.trimEnd());
}

/** The function an id names, in any letter case, with or without the namespace. */
export function findFunction(bundle: LoadedBundle, name: string): FunctionMetadata | undefined {
  const id = name.trim().toUpperCase().replace(new RegExp(`^=?${NAMESPACE}\\.`), "").replace(/\(.*$/, "");
  return bundle.metadata.find((m) => m.id === id);
}

/** Ids that contain every word of a name that matched none (for "did you mean"). */
export function similarIds(bundle: LoadedBundle, name: string): string[] {
  const words = name.toUpperCase().split(/[^A-Z0-9]+/).filter((w) => w.length > 1);
  return bundle.metadata.filter((m) => words.length > 0 && words.some((w) => m.id.includes(w))).map((m) => m.id).slice(0, 8);
}

/** The help page of one function (without its evaluated example). */
export function helpLines(bundle: LoadedBundle, m: FunctionMetadata): string[] {
  const width = Math.max(...m.parameters.map((p) => p.name.length), 4);
  const lines = [typedName(signature(m)), "", m.description ?? "", ""];
  if (m.parameters.length === 0) lines.push("No parameters.");
  else {
    lines.push("Parameters (units in the description):");
    for (const p of m.parameters) lines.push(`  ${p.name.padEnd(width)}  ${p.optional ? "(optional) " : ""}${p.description ?? ""}`);
  }
  const example = bundle.exampleOf?.(m.id);
  if (example) lines.push("", "Example:", `  ${example}`);
  return lines;
}
