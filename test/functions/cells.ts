import { expect } from "vitest";
import { CellError } from "../../src/runner/host";

/** A worksheet function as a test calls it: any argument shape, a bare value standing for one cell. */
export type SheetFunction = (...args: unknown[]) => unknown[][];

/** A family module's functions, typed for calls with bare values as well as Excel's matrices. */
export const sheet = <T extends object>(family: T): Record<keyof T, SheetFunction> => family as unknown as Record<keyof T, SheetFunction>;

/** The cell's error code, or the cell itself when it is a value. */
export const code = (c: unknown): unknown => (c instanceof CellError ? c.code : c);

/** The cell error's message, undefined for a value. */
export const msg = (c: unknown): string | undefined => (c instanceof CellError ? c.message : undefined);

export { expectPrinted } from "../support/expect";

/** The single cell of a one-cell result. */
export const only = (g: unknown[][]): unknown => {
  expect(g.length).toBe(1);
  expect(g[0].length).toBe(1);
  return g[0][0];
};
