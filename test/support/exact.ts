import Decimal from "decimal.js";

/** 50-digit decimal arithmetic for reference recomputation (a local clone, never global settings). */
export const HP = Decimal.clone({ precision: 50 });

/**
 * The exact value of a double as a 50-digit decimal. `new Decimal(x)` would take the shortest
 * decimal string that round-trips, which differs from the binary value by up to half an ulp;
 * toPrecision(40) gives the binary value's own digits.
 */
export const exactDecimal = (x: number): Decimal => new HP(x.toPrecision(40));
