/**
 * How ORBIT function names are written, and the formula rewrites between the three places a
 * formula lives: what a user types, what Excel stores in an .xlsx file, and what the headless
 * engine parses.
 *
 * Typed form: `ORBIT.ORBITAL_SPEED(...)` (namespace from the manifest, a dot, the id).
 * Stored form: `_xldudf_ORBIT_ORBITAL_SPEED(...)`. Excel saves a formula that calls an Office.js
 * custom function under the prefix `_xldudf_` with the namespace's dot turned into an underscore,
 * and only a formula in that form is bound to the add-in when the file is opened again; a formula
 * saved in the typed form stays #NAME? even after the add-in loads. Sources: Microsoft's
 * custom-functions team in OfficeDev/Excel-Custom-Functions issue #108 ("for JavaScript custom
 * functions we by default save out with a different prefix _xldudf"); the sheet XML quoted in
 * evelyn-chrono/officejs-custom-functions-name-error-repro (README, `<f t="array"
 * ref="A1">_xldudf_CONTOSO_ADD(1,2)</f>` for `=CONTOSO.ADD(1,2)`), filed as OfficeDev/office-js
 * issue #6611. A stray external-link prefix `[n]!` in front of `_xldudf_` (OfficeDev/office-js
 * issue #2568) is accepted and dropped. Excel also prefixes newer built-in functions with
 * `_xlfn.` / `_xlws.` (MS-XLSX "future functions"); the engine gets them without the prefix.
 */
export const NAMESPACE = "ORBIT";

export const typedName = (id: string): string => `${NAMESPACE}.${id}`;
export const storedName = (id: string): string => `_xldudf_${NAMESPACE}_${id}`;

const IDENT = /[A-Za-z0-9_.\u00C0-\u02AF]/;
const STORED_CALL = new RegExp(`^(?:\\[\\d+\\]!)?_xldudf_${NAMESPACE}_([A-Za-z0-9_]+)\\s*\\(`, "i");
const TYPED_CALL = new RegExp(`^${NAMESPACE}\\.([A-Za-z0-9_]+)\\s*\\(`, "i");
const FUTURE_PREFIX = /^(?:_xlfn\.|_xlws\.)+/i;
const BOOLEAN_WORD = /^(TRUE|FALSE)(?![A-Za-z0-9_.(!\u00C0-\u02AF])/i;

/**
 * Walks a formula outside its string literals ("...") and quoted sheet names ('...'), offering
 * each position that starts a word to `at`, which returns [consumed length, replacement] or null.
 */
function rewrite(formula: string, at: (rest: string) => [number, string] | null): string {
  let out = "";
  let i = 0;
  while (i < formula.length) {
    const ch = formula[i];
    if (ch === '"' || ch === "'") {
      let j = i + 1;
      while (j < formula.length) {
        if (formula[j] === ch) {
          if (formula[j + 1] === ch) j += 2;
          else break;
        } else j++;
      }
      out += formula.slice(i, j + 1);
      i = j + 1;
      continue;
    }
    const startsWord = (ch === "[" || !IDENT.test(formula[i - 1] ?? " ")) && (IDENT.test(ch) || ch === "[");
    if (startsWord) {
      const hit = at(formula.slice(i));
      if (hit) {
        out += hit[1];
        i += hit[0];
        continue;
      }
    }
    out += ch;
    i++;
  }
  return out;
}

/** Upper-cases an id as the engine registers it. */
const canonicalId = (id: string): string => id.toUpperCase();

/**
 * The formula as the engine parses it: stored ORBIT names become typed names, `_xlfn.`/`_xlws.`
 * prefixes go, and the boolean words TRUE / FALSE become the engine's TRUE() / FALSE().
 * Accepts a formula with or without the leading "=" and returns it with one.
 */
export function toEngineFormula(formula: string): string {
  const body = formula.startsWith("=") ? formula.slice(1) : formula;
  return (
    "=" +
    rewrite(body, (rest) => {
      const stored = STORED_CALL.exec(rest);
      if (stored) return [stored[0].length, `${typedName(canonicalId(stored[1]))}(`];
      const future = FUTURE_PREFIX.exec(rest);
      if (future) return [future[0].length, ""];
      const word = BOOLEAN_WORD.exec(rest);
      if (word) return [word[0].length, `${word[1].toUpperCase()}()`];
      return null;
    })
  );
}

/**
 * The formula as it is written into an .xlsx file (without "="): typed ORBIT names become the
 * stored form Excel itself writes, so the add-in binds them when the file is opened. Everything
 * else is kept as the file had it.
 */
export function toStoredFormula(formula: string): string {
  const body = formula.startsWith("=") ? formula.slice(1) : formula;
  return rewrite(body, (rest) => {
    const typed = TYPED_CALL.exec(rest);
    if (typed) return [typed[0].length, `${storedName(canonicalId(typed[1]))}(`];
    const stored = STORED_CALL.exec(rest);
    if (stored) return [stored[0].length, `${storedName(canonicalId(stored[1]))}(`];
    return null;
  });
}

/**
 * The id of the ORBIT call that is the whole formula (`=ORBIT.X(...)`, either form), or undefined
 * when the formula is anything else (an expression around a call, or no call).
 */
export function rootOrbitCall(formula: string): string | undefined {
  const body = (formula.startsWith("=") ? formula.slice(1) : formula).trim();
  const m = TYPED_CALL.exec(body) ?? STORED_CALL.exec(body);
  if (!m) return undefined;
  let depth = 0;
  let quote = "";
  for (let i = m[0].length - 1; i < body.length; i++) {
    const ch = body[i];
    if (quote) {
      if (ch === quote) quote = body[i + 1] === quote ? (i++, quote) : "";
    } else if (ch === '"' || ch === "'") quote = ch;
    else if (ch === "(") depth++;
    else if (ch === ")" && --depth === 0) return i === body.length - 1 ? canonicalId(m[1]) : undefined;
  }
  return undefined;
}

/** The ORBIT ids a formula calls, in either form (upper case, in order of appearance). */
export function orbitCalls(formula: string): string[] {
  const ids: string[] = [];
  rewrite(formula.startsWith("=") ? formula.slice(1) : formula, (rest) => {
    const m = TYPED_CALL.exec(rest) ?? STORED_CALL.exec(rest);
    if (m) ids.push(canonicalId(m[1]));
    return null;
  });
  return ids;
}
