/**
 * The error contract of the numeric core (DEVELOPERS.md, "Error contract"): a core function never throws, never
 * returns NaN or Infinity; when it cannot answer it returns a DomainError value naming the sheet
 * parameter concerned. The worksheet adaptor turns the kind into the cell error:
 *   bad_argument → #VALUE!   (wrong type or outside the parameter's domain)
 *   no_answer    → #N/A      (valid inputs for which no answer exists)
 *   arithmetic   → #NUM!     (the arithmetic itself failed: overflow, no convergence)
 * Messages have one fixed shape so a cell reads the same whatever produced it:
 *   "<parameter>: got <value>; expected <what is allowed>."   (bad_argument)
 *   "<parameter>: <why there is no answer>."                   (no_answer, arithmetic)
 */
export type DomainErrorKind = "bad_argument" | "no_answer" | "arithmetic";

export class DomainError {
  constructor(
    readonly kind: DomainErrorKind,
    /** Sheet parameter name (lower_snake), or "" when the failure concerns no single one. */
    readonly parameter: string,
    readonly message: string,
  ) {}
}

/** A value, or the reason there is none. */
export type Result<T> = T | DomainError;

export function isDomainError(x: unknown): x is DomainError {
  return x instanceof DomainError;
}

/** Renders a received value for a message: numbers to 10 significant digits, text quoted. */
export function formatValue(value: unknown): string {
  if (value === null || value === undefined) return "(blank)";
  if (typeof value === "number") {
    if (Number.isNaN(value)) return "NaN";
    if (!Number.isFinite(value)) return value > 0 ? "+Infinity" : "-Infinity";
    return Number.isInteger(value) && Math.abs(value) < 1e15 ? String(value) : String(Number(value.toPrecision(10)));
  }
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  if (typeof value === "string") return JSON.stringify(value.length > 40 ? value.slice(0, 37) + "..." : value);
  if (Array.isArray(value)) return "a range";
  return typeof value;
}

export function badArgument(parameter: string, value: unknown, allowed: string): DomainError {
  return new DomainError("bad_argument", parameter, `${parameter}: got ${formatValue(value)}; expected ${allowed}.`);
}

/** A bad argument whose received value is described rather than shown ("a 2x1 range"). */
export function badArgumentDescribed(parameter: string, described: string, allowed: string): DomainError {
  return new DomainError("bad_argument", parameter, `${parameter}: got ${described}; expected ${allowed}.`);
}

export function noAnswer(parameter: string, reason: string): DomainError {
  return new DomainError("no_answer", parameter, `${parameter ? parameter + ": " : ""}${reason}.`);
}

export function arithmeticFailure(parameter: string, reason: string): DomainError {
  return new DomainError("arithmetic", parameter, `${parameter ? parameter + ": " : ""}${reason}.`);
}

// Argument guards. Each returns the error, or undefined when the value is allowed, so a core
// function reads: `const bad = positive("radius", radius, "km"); if (bad) return bad;`.

export function finite(parameter: string, value: number, unit = ""): DomainError | undefined {
  return Number.isFinite(value) ? undefined : badArgument(parameter, value, `a finite number${unit ? " of " + unit : ""}`);
}

export function positive(parameter: string, value: number, unit = ""): DomainError | undefined {
  return value > 0 && Number.isFinite(value)
    ? undefined
    : badArgument(parameter, value, `a positive number${unit ? " of " + unit : ""}`);
}

export function nonNegative(parameter: string, value: number, unit = ""): DomainError | undefined {
  return value >= 0 && Number.isFinite(value)
    ? undefined
    : badArgument(parameter, value, `zero or a positive number${unit ? " of " + unit : ""}`);
}

/** Closed interval [lo, hi]. */
export function within(parameter: string, value: number, lo: number, hi: number, what: string): DomainError | undefined {
  return value >= lo && value <= hi ? undefined : badArgument(parameter, value, what);
}

/** First defined error among guards, so several checks stay one line. */
export function firstError(...checks: (DomainError | undefined)[]): DomainError | undefined {
  for (const c of checks) if (c) return c;
  return undefined;
}

/** A computed number that overflowed or lost meaning becomes #NUM!, never NaN or Infinity. */
export function finiteResult(parameter: string, value: number): Result<number> {
  return Number.isFinite(value) ? value : arithmeticFailure(parameter, "the result overflows float64 for these inputs");
}

/**
 * `fn` applied to the values when none of them is an error; otherwise the first error, in the
 * order given. Keeps a chain of lookups that may each fail ("the body's radius, then its J2, then
 * ...") to one expression.
 */
export function withAll<const T extends readonly unknown[], R>(results: { readonly [K in keyof T]: T[K] | DomainError }, fn: (...values: T) => R): R | DomainError {
  for (const r of results) if (r instanceof DomainError) return r;
  return fn(...(results as unknown as T));
}
