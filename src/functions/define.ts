import type { Result } from "../core/domain";
import { argumentNames, liftArgs, row, scalar, tableArgs, type CellValue, type Grid, type ValuesOf } from "./lift";
import type { ExampleArg } from "./examples";
import type { ListParam, Param } from "./params";
import { REGISTRY_GLOBAL, type FunctionSpec, type Registry, type SizeRule } from "./registry";

export type { FunctionSpec, Registry, Shape, SizeRule, SizeView } from "./registry";

/**
 * One worksheet function, declared in one place: its parameter readers (the adaptor's lift spec),
 * the core call, a worked example and search terms. A family file writes each function as one
 * unit: this declaration, then the JSDoc block (the single source of the id, parameter names and
 * help that custom-functions-metadata turns into functions.json), then the exported wrapper,
 * whose body is one line: `return ID(arguments);`.
 *
 *   const ESCAPE_SPEED = define.scalar("ESCAPE_SPEED", [gm(), num("radius", "km")], twobody.escapeSpeed, {
 *     example: ["Earth", 6898.137],
 *   });
 *   /** Escape speed ... @customfunction ESCAPE_SPEED ... *\/
 *   export function escapeSpeed(body: any[][], radius: any[][]): any[][] {
 *     return ESCAPE_SPEED(arguments);
 *   }
 *
 * Every declaration lands in a registry that the bundle publishes on the global object as
 * `OrbitCellsRegistry` (see `Registry`): the headless runner reads result-size rules from it, the
 * pane's function guide reads examples and search terms, and the contract tests check that each
 * declaration's parameter names and order are those of functions.json.
 */

const registry: Registry = { specs: new Map(), lastCalled: "" };
(globalThis as Record<string, unknown>)[REGISTRY_GLOBAL] = registry;

/** A declared function as its wrapper calls it: Excel's arguments in, the result matrix out. */
export type SheetCall = (args: ArrayLike<unknown>) => Grid;

interface Extras {
  readonly example: readonly ExampleArg[];
  readonly terms?: readonly string[];
}

interface TableExtras<P extends readonly unknown[]> extends Extras {
  /** Header labels from the arguments; with them the function takes a last include_header argument. */
  readonly labels?: (...args: ValuesOf<P>) => readonly string[];
  readonly size: SizeRule;
}


const choicesOf = (params: readonly (Param<any> | ListParam<any>)[]): FunctionSpec["choices"] =>
  Object.fromEntries(params.flatMap((p) => ("choices" in p && p.choices ? [[p.name, p.choices]] : [])));

function register(spec: Omit<FunctionSpec, "run">, run: SheetCall): SheetCall {
  if (registry.specs.has(spec.id)) throw new Error(`worksheet function ${spec.id} is declared twice`);
  const id = spec.id;
  const call: SheetCall = (args) => {
    registry.lastCalled = id;
    return run(args);
  };
  registry.specs.set(id, { ...spec, run: call });
  return call;
}

/** The declarations of one family (the heading the function guide groups them under). */
export function family(name: string) {
  return {
    /** One value per case: the result has the broadcast shape of the arguments. */
    scalar<const P extends readonly Param<any>[]>(id: string, params: P, core: (...args: ValuesOf<P>) => Result<CellValue>, extras: Extras): SheetCall {
      return register(
        { id, family: name, kind: "scalar", params: argumentNames(params, false), roles: params.map((p) => p.role), choices: choicesOf(params), lists: [], labels: [], example: extras.example, terms: extras.terms ?? [] },
        liftArgs(scalar, params, core as (...a: any[]) => unknown),
      );
    },

    /** Several values per case, one row per case under these labels; takes a last include_header argument. */
    rows<const P extends readonly Param<any>[]>(id: string, labels: readonly string[], params: P, core: (...args: ValuesOf<P>) => Result<readonly CellValue[]>, extras: Extras): SheetCall {
      return register(
        { id, family: name, kind: "rows", params: argumentNames(params, true), roles: [...params.map((p) => p.role), undefined], choices: choicesOf(params), lists: [], labels, example: extras.example, terms: extras.terms ?? [] },
        liftArgs(row(...labels), params, core as (...a: any[]) => unknown),
      );
    },

    /** A whole-range function: list parameters take their whole range, the core returns the rows. */
    table<const P extends readonly (Param<any> | ListParam<any>)[]>(
      id: string,
      params: P,
      core: (...args: ValuesOf<P>) => Result<readonly (readonly CellValue[])[]>,
      extras: TableExtras<P>,
    ): SheetCall {
      return register(
        {
          id,
          family: name,
          kind: "table",
          params: argumentNames(params, extras.labels !== undefined),
          roles: params.map((p) => ("role" in p ? p.role : undefined)),
          choices: choicesOf(params),
          lists: params.filter((p) => "list" in p).map((p) => p.name),
          labels: [],
          example: extras.example,
          terms: extras.terms ?? [],
          size: extras.size,
        },
        tableArgs(params, core, extras.labels),
      );
    },
  };
}
