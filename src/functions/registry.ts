import type { ExampleArg } from "./examples";

/**
 * The shape of the registry the functions bundle publishes (src/functions/define.ts fills it): what
 * the runner, the pane and the tests read of each worksheet function's declaration. Types and the
 * global's name only, no side effects, so the pane can import it without loading the functions.
 */
export interface Shape {
  readonly rows: number;
  readonly cols: number;
}

/**
 * What the runner knows of a whole-range function's arguments before evaluating it, read by
 * parameter name (the runner implements this over the formula's parsed arguments).
 */
export interface SizeView {
  /** The argument is omitted. */
  omitted(name: string): boolean;
  /** How many names a list argument carries (comma-separated words of a literal text, else one per cell). */
  names(name: string): number | undefined;
  /** How many cells the argument has. */
  cells(name: string): number | undefined;
  /** A whole number of 1 or more written as a literal. */
  integer(name: string): number | undefined;
  /** include_header: false when omitted, else its literal value. */
  header(): boolean;
  /** The size the function gives with every argument omitted. */
  defaults(): Shape | undefined;
}

/** A whole-range function's result size from its arguments, or undefined when it cannot be known before evaluation. */
export type SizeRule = (a: SizeView) => Shape | undefined;

export type FunctionKind = "scalar" | "rows" | "table";

export interface FunctionSpec {
  readonly id: string;
  readonly family: string;
  readonly kind: FunctionKind;
  /** Parameter names in order, include_header last where the function has one: functions.json's order. */
  readonly params: readonly string[];
  /** What each parameter stands for where the adaptor checks it (see Role in params.ts), in params' order. */
  readonly roles: readonly (string | undefined)[];
  /** The closed set of words a parameter takes, by parameter name (offered as Excel AutoComplete suggestions). */
  readonly choices: Readonly<Record<string, readonly { readonly value: string; readonly tooltip: string }[]>>;
  /** Parameters that take a whole range as one list (whole-range functions). */
  readonly lists: readonly string[];
  /** Header labels (with units) of a function giving several values per case. */
  readonly labels: readonly string[];
  /** A worked call, one value per leading parameter; the contract tests call every function with it. */
  readonly example: readonly ExampleArg[];
  /** Words people search for besides the name: synonyms and terms of the trade. */
  readonly terms: readonly string[];
  /** Whole-range functions: the result size before evaluation. */
  readonly size?: SizeRule;
  /** The declaration itself, as its wrapper calls it: lets the pane see the shape its example spills to. */
  readonly run: (args: ArrayLike<unknown>) => unknown[][];
}

/** What the bundle publishes as `globalThis.OrbitCellsRegistry`. */
export interface Registry {
  readonly specs: Map<string, FunctionSpec>;
  /** Id of the declaration that ran last: lets a test prove which declaration a worksheet id calls. */
  lastCalled: string;
}

export const REGISTRY_GLOBAL = "OrbitCellsRegistry";

