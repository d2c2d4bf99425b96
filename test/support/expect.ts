import { expect } from "vitest";
import { isDomainError, type DomainError } from "../../src/core/domain";

/** Equal to a printed value at its number of decimals (within half a unit of the last digit). */
export function expectPrinted(actual: unknown, printed: number, decimals: number): void {
  expect(typeof actual).toBe("number");
  expect(Math.abs((actual as number) - printed)).toBeLessThanOrEqual(0.5 * 10 ** -decimals * (1 + 1e-9));
}

/** Within a relative tolerance of the expected value. */
export function expectRelative(actual: unknown, expected: number, rel: number): void {
  expect(typeof actual).toBe("number");
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

/** A core DomainError of this kind naming this parameter. */
export function expectError(r: unknown, kind: string, parameter: string): void {
  expect(isDomainError(r)).toBe(true);
  expect((r as DomainError).kind).toBe(kind);
  expect((r as DomainError).parameter).toBe(parameter);
}

/** The value of a core Result; fails the test with the error's message when it is an error. */
export function ok<T>(x: T | DomainError): T {
  if (isDomainError(x)) throw new Error(x.message);
  return x;
}

/** The DomainError of a core Result; fails the test when it is a value. */
export function err(x: unknown): DomainError {
  if (!isDomainError(x)) throw new Error(`expected an error, got ${JSON.stringify(x)}`);
  return x;
}
