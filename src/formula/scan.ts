import { NAMESPACE } from "./namespace";

/**
 * Finding ORBIT calls in a formula, in the typed form (`ORBIT.X(`) and the stored form Excel
 * writes (`_xldudf_ORBIT_X(`), outside string literals ("...") and quoted sheet names ('...').
 * Lexical rules from ECMA-376 Part 1, §18.17.2 Syntax (a token starts where the previous
 * character cannot continue a name; no space between a function name and its left parenthesis)
 * and §18.17.2.1 Constants (a quote inside a string literal is written twice). A stray
 * external-link prefix `[n]!` in front of `_xldudf_` (OfficeDev/office-js issue #2568) is
 * accepted. Ids come back upper case, as the functions are registered.
 */

const UNDERSCORE = 95;
const DOT = 46;
const DQUOTE = 34;
const APOSTROPHE = 39;
const LBRACKET = 91;
const RBRACKET = 93;

/** Whether a character (code) can continue a name or a number: letters, digits, `_`, `.`, accented letters. */
export function isNameChar(c: number): boolean {
  return (c >= 97 && c <= 122) || (c >= 65 && c <= 90) || (c >= 48 && c <= 57) || c === UNDERSCORE || c === DOT || (c >= 0xc0 && c <= 0x2af);
}

/** Index just past the string literal or quoted sheet name that opens at `i` (a doubled quote stays inside). */
export function skipQuoted(formula: string, i: number): number {
  const q = formula.charCodeAt(i);
  let j = i + 1;
  while (j < formula.length) {
    if (formula.charCodeAt(j) === q) {
      if (formula.charCodeAt(j + 1) === q) j += 2;
      else return j + 1;
    } else j++;
  }
  return formula.length;
}

/**
 * Index just past the bracketed part that opens at `i` ("[" ... "]", nested), as in a structured
 * reference: inside brackets an apostrophe escapes the next character (MS-XLSX §2.2.2,
 * escape-column-character), and quotes delimit nothing.
 */
export function skipBracketed(formula: string, i: number): number {
  let depth = 0;
  let j = i;
  while (j < formula.length) {
    const c = formula.charCodeAt(j);
    if (c === APOSTROPHE) j += 2;
    else {
      if (c === LBRACKET) depth++;
      else if (c === RBRACKET && --depth === 0) return j + 1;
      j++;
    }
  }
  return formula.length;
}

/**
 * Walks a formula's tokens: string literals, quoted sheet names and bracketed parts are stepped
 * over whole, and `visit` is offered each index that starts a token; it returns the index to go
 * on from when it consumed something there, or undefined.
 */
export function walkTokens(formula: string, visit: (i: number) => number | undefined): void {
  let i = 0;
  const n = formula.length;
  while (i < n) {
    const c = formula.charCodeAt(i);
    if (c === DQUOTE || c === APOSTROPHE) {
      i = skipQuoted(formula, i);
      continue;
    }
    if (i === 0 || !isNameChar(formula.charCodeAt(i - 1))) {
      const next = visit(i);
      if (next !== undefined) {
        i = next;
        continue;
      }
    }
    i = c === LBRACKET ? skipBracketed(formula, i) : i + 1;
  }
}

const TYPED_CALL = new RegExp(`${NAMESPACE}\\.([A-Za-z0-9_]+)\\s*\\(`, "iy");
const STORED_CALL = new RegExp(`(?:\\[\\d+\\]!)?_xldudf_${NAMESPACE}_([A-Za-z0-9_]+)\\s*\\(`, "iy");

/** An ORBIT call opening at a token start: its id (upper case), form, and the index of its "(". */
export interface CallStart {
  readonly id: string;
  readonly form: "typed" | "stored";
  /** Index just past the call's name (and any spaces) in the formula, i.e. of its "(" plus one. */
  readonly end: number;
}

/** The ORBIT call whose name starts at index i (a token start), in either form, or undefined. */
export function orbitCallAt(formula: string, i: number): CallStart | undefined {
  const c = formula.charCodeAt(i);
  // Cheap first-character test before the regular expressions: "O"/"o" typed, "_" or "[" stored.
  if (c === 79 || c === 111) {
    TYPED_CALL.lastIndex = i;
    const m = TYPED_CALL.exec(formula);
    return m ? { id: m[1].toUpperCase(), form: "typed", end: i + m[0].length } : undefined;
  }
  if (c === UNDERSCORE || c === 91) {
    STORED_CALL.lastIndex = i;
    const m = STORED_CALL.exec(formula);
    return m ? { id: m[1].toUpperCase(), form: "stored", end: i + m[0].length } : undefined;
  }
  return undefined;
}

/** The formula without its leading "=" (if any). */
export const formulaBody = (formula: string): string => (formula.charCodeAt(0) === 61 ? formula.slice(1) : formula);

/**
 * The arguments of the call whose "(" is at index open - 1, as source text (trimmed), split at the
 * commas of its own level, and the index just past its ")" (the formula's length if unclosed).
 * `f()` has no arguments; `f(,)` has two empty ones.
 */
export function callArguments(formula: string, open: number): { args: string[]; end: number } {
  const args: string[] = [];
  let depth = 0;
  let start = open;
  let i = open;
  while (i < formula.length) {
    const ch = formula[i];
    if (ch === '"' || ch === "'") {
      i = skipQuoted(formula, i);
      continue;
    }
    if (ch === "[") {
      i = skipBracketed(formula, i);
      continue;
    }
    if (ch === "(" || ch === "{") depth++;
    else if (ch === ")" || ch === "}") {
      if (depth === 0) {
        const last = formula.slice(start, i).trim();
        if (last !== "" || args.length > 0) args.push(last);
        return { args, end: i + 1 };
      }
      depth--;
    } else if (ch === "," && depth === 0) {
      args.push(formula.slice(start, i).trim());
      start = i + 1;
    }
    i++;
  }
  const last = formula.slice(start).trim();
  if (last !== "" || args.length > 0) args.push(last);
  return { args, end: formula.length };
}

/** Every ORBIT call in a formula, either form, with its number of arguments, in order of appearance. */
export function orbitCalls(formula: string): { id: string; args: number }[] {
  const out: { id: string; args: number }[] = [];
  walkTokens(formula, (i) => {
    const call = orbitCallAt(formula, i);
    if (!call) return undefined;
    out.push({ id: call.id, args: callArguments(formula, call.end).args.length });
    return call.end;
  });
  return out;
}

/** Whether a formula calls any ORBIT function (either form). */
export function callsOrbit(formula: string): boolean {
  let found = false;
  walkTokens(formula, (i) => {
    if (found || !orbitCallAt(formula, i)) return undefined;
    found = true;
    return formula.length;
  });
  return found;
}

/**
 * The id of the ORBIT call that is the whole formula (`=ORBIT.X(...)`, either form, spaces
 * around allowed), or undefined when the formula is anything else (an expression around a call,
 * or no call).
 */
export function rootOrbitCall(formula: string): string | undefined {
  const body = formulaBody(formula).trim();
  const call = orbitCallAt(body, 0);
  if (!call) return undefined;
  return callArguments(body, call.end).end === body.length && body.endsWith(")") ? call.id : undefined;
}
