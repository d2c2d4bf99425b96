import type { Sourced } from "./types";

/** Excel shows at most 15 significant digits of a number. */
export const MAX_SHOWN_DIGITS = 15;

/**
 * Significant digits of a number as its source prints it: the digits of its shortest decimal
 * text, first rounded to 15 significant digits, which removes the binary noise of a kernel's
 * 17-digit E-format (2.2031868551400003E+04 is the 12-digit 22031.8685514), with trailing
 * zeros not counted (695 700 km: 4 digits, as in IAU 2015 B3's 6.957e8 m). 0 has 1 digit.
 */
export function printedDigits(x: number): number {
  if (!Number.isFinite(x) || x === 0) return 1;
  const mantissa = Math.abs(x).toPrecision(MAX_SHOWN_DIGITS).split("e")[0].replace(".", "").replace(/^0+/, "").replace(/0+$/, "");
  return Math.max(1, mantissa.length);
}

/** Significant digits a catalogue value carries: its `digits` where set, else as printed; at most 15. */
export function sourceDigits(s: Sourced): number {
  return Math.min(MAX_SHOWN_DIGITS, Math.max(1, Math.round(s.digits ?? printedDigits(s.value))));
}
