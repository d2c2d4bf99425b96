import { readFileSync } from "node:fs";
import * as vm from "node:vm";
import { exampleFormula } from "../functions/examples";
import { REGISTRY_GLOBAL, type Registry } from "../functions/registry";

/**
 * A stand-in for Excel's custom-functions runtime: loads the BUILT dist/functions.js in a fresh
 * JavaScript context whose only extra global is `CustomFunctions`, and collects what the bundle
 * associates. The contract tests and the headless runner both call the functions through it, by
 * id, exactly as Excel does.
 */
export const ERROR_CODES = {
  invalidValue: "#VALUE!",
  notAvailable: "#N/A",
  divisionByZero: "#DIV/0!",
  invalidNumber: "#NUM!",
  nullReference: "#NULL!",
  invalidName: "#NAME?",
  invalidReference: "#REF!",
} as const;

export type ErrorCode = (typeof ERROR_CODES)[keyof typeof ERROR_CODES];

/** What a cell error looks like coming out of the bundle. */
export class CellError {
  constructor(
    readonly code: ErrorCode,
    readonly message?: string,
  ) {}
}

export function isCellError(x: unknown): x is CellError {
  return x instanceof CellError;
}

export type WorksheetFunction = (...args: unknown[]) => unknown;

export interface FunctionMetadata {
  id: string;
  name: string;
  description?: string;
  helpUrl?: string;
  parameters: { name: string; description?: string; type?: string; dimensionality?: string; optional?: boolean }[];
  result: { type?: string; dimensionality?: string };
}

export interface LoadedBundle {
  functions: Map<string, WorksheetFunction>;
  metadata: FunctionMetadata[];
  /** Ids associated more than once (should be none). */
  duplicates: string[];
  /** The declarations the bundle publishes (src/functions/define.ts): size rules, examples, search terms. */
  registry: Registry;
  /** The worked example formula of a function (e.g. =ORBIT.ORBITAL_SPEED("Earth", 6898.137)), if it has one. */
  exampleOf(id: string): string | undefined;
}

/**
 * Loads dist/functions.js and dist/functions.json from `distDir`. `isolated` runs the bundle in a
 * fresh context whose only global beyond the language's own is CustomFunctions (the contract
 * test's proof that the bundle needs nothing else); otherwise it runs in this context with
 * CustomFunctions passed in, which is how it should be timed: a contextified global object makes
 * every global lookup (Math, Number, ...) go through an interceptor, several times slower than in
 * Excel's own JavaScript runtime.
 */
export function loadBundle(distDir: string, options: { isolated?: boolean } = {}): LoadedBundle {
  const code = readFileSync(`${distDir}/functions.js`, "utf8");
  const metadata = (JSON.parse(readFileSync(`${distDir}/functions.json`, "utf8")) as { functions: FunctionMetadata[] }).functions;
  const functions = new Map<string, WorksheetFunction>();
  const duplicates: string[] = [];
  const CustomFunctions = {
    associate(id: string, fn: WorksheetFunction) {
      if (functions.has(id)) duplicates.push(id);
      functions.set(id, fn);
    },
    Error: CellError,
    ErrorCode: ERROR_CODES,
  };
  // The bundle publishes its registry on the global object; each load gets a global of its own.
  const global: Record<string, unknown> = { CustomFunctions };
  if (options.isolated) vm.runInNewContext(code, global, { filename: "functions.js" });
  else (vm.compileFunction(code, ["CustomFunctions", "globalThis"], { filename: "functions.js" }) as (cf: unknown, g: unknown) => void)(CustomFunctions, global);
  const registry = global[REGISTRY_GLOBAL] as Registry | undefined;
  if (registry === undefined) throw new Error(`${distDir}/functions.js published no ${REGISTRY_GLOBAL}: rebuild with npm run build`);
  // The worked examples are the declarations' own (the same ones the pane's function guide shows).
  const exampleOf = (id: string): string | undefined => {
    const spec = registry.specs.get(id);
    return spec ? exampleFormula(id, spec.example, spec.roles) : undefined;
  };
  return { functions, metadata, duplicates, registry, exampleOf };
}
