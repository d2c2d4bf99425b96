import { badArgument, isDomainError, type DomainError, type Result } from "./domain";
import { julianDateFromDayOfYear } from "./julian";

/**
 * Two-line element sets (TLE): the fixed-column text format of the US Space Command catalogue,
 * read and checked. Layout: Hoots and Roehrich, Spacetrack Report No. 3 (1980), and Vallado,
 * Crawford, Hujsak, Kelso, "Revisiting Spacetrack Report #3", AIAA 2006-6753, Appendix
 * (columns as in the CelesTrak format description by T. S. Kelso, "NORAD Two-Line Element Set
 * Format"). Columns are 1-based as those documents number them:
 *
 *   line 1: 1 '1' | 3-7 catalogue number | 8 classification | 10-17 international designator |
 *           19-20 epoch year | 21-32 epoch day of year | 34-43 ndot/2 (rev/day^2) |
 *           45-52 nddot/6 (rev/day^3, assumed decimal point) | 54-61 B* (1/Earth radii, assumed
 *           decimal point) | 63 ephemeris type | 65-68 element set number | 69 checksum
 *   line 2: 1 '2' | 3-7 catalogue number | 9-16 inclination deg | 18-25 RAAN deg |
 *           27-33 eccentricity (assumed leading decimal point) | 35-42 argument of perigee deg |
 *           44-51 mean anomaly deg | 53-63 mean motion rev/day | 64-68 revolution number | 69 checksum
 *
 * Checksum: the sum of the digits of columns 1-68, each minus sign counting 1, modulo 10.
 * Epoch-year rule: two-digit years 57-99 are 1957-1999 and 00-56 are 2000-2056 (Spacetrack
 * Report #3; Vallado et al. 2006). Every field is checked against its layout, so a line pasted
 * with a shifted column or a lost character is refused with the column range and what it holds.
 * The catalogue number may be in the Alpha-5 form (a letter for the ten-thousands, e.g. "A0001").
 * Lines may carry trailing spaces; anything else beyond column 69 is refused.
 */

export interface TleElements {
  catalogueNumber: string;
  /** Epoch, Julian date (UTC). */
  epoch: number;
  /** Inclination, deg. */
  inclination: number;
  /** Right ascension of the ascending node, deg. */
  raan: number;
  eccentricity: number;
  /** Argument of perigee, deg. */
  argp: number;
  /** Mean anomaly, deg. */
  meanAnomaly: number;
  /** Mean motion, rev/day. */
  meanMotion: number;
  /** Drag term B*, 1/Earth radii. */
  bstar: number;
  /** First derivative of the mean motion divided by 2, rev/day^2. */
  ndot: number;
  /** Second derivative of the mean motion divided by 6, rev/day^3. */
  nddot: number;
}

/** Parameter names for the two lines: the sheet's line1/line2, or one name (e.g. "source") for both. */
export type TleParameterNames = readonly [string, string];

/** Kernel: the checksum digit of a line (columns 1-68). */
export function tleChecksum(line: string): number {
  let sum = 0;
  for (let k = 0; k < 68 && k < line.length; k++) {
    const c = line.charCodeAt(k);
    if (c >= 48 && c <= 57) sum += c - 48;
    else if (c === 45) sum += 1;
  }
  return sum % 10;
}

interface Field {
  from: number; // 1-based first column
  to: number; // 1-based last column
  pattern: RegExp;
  holds: string;
}

const SATNUM = /^[0-9A-Z ][0-9 ]{3}[0-9]$/;

const LINE1: Field[] = [
  { from: 1, to: 2, pattern: /^1 $/, holds: `"1 " (line number 1 and a space)` },
  { from: 3, to: 7, pattern: SATNUM, holds: "the catalogue number, five digits (or a letter and four digits)" },
  { from: 8, to: 9, pattern: /^[UCS ] $/, holds: "the classification U, C or S, then a space" },
  { from: 10, to: 18, pattern: /^[0-9 ]{5}[A-Z ]{3} $/, holds: "the international designator (launch year, number, piece, or blank), then a space" },
  { from: 19, to: 32, pattern: /^[0-9]{2}[ 0-9]{3}\.[0-9]{8}$/, holds: 'the epoch: two-digit year and day of the year with 8 decimals, e.g. "26123.45678901"' },
  { from: 33, to: 43, pattern: /^ [ +-]\.[0-9]{8}$/, holds: 'a space and the first derivative of the mean motion over 2, e.g. " .00001234" or "-.00000084"' },
  { from: 44, to: 52, pattern: /^ [ +-][0-9]{5}[+-][0-9]$/, holds: 'a space and the second derivative of the mean motion over 6 with an assumed decimal point, e.g. " 00000-0"' },
  { from: 53, to: 61, pattern: /^ [ +-][0-9]{5}[+-][0-9]$/, holds: 'a space and the drag term B* with an assumed decimal point, e.g. " 28098-4"' },
  { from: 62, to: 64, pattern: /^ [0-9 ] $/, holds: "a space, the ephemeris type (a digit, usually 0) and a space" },
  { from: 65, to: 68, pattern: /^[ 0-9]{3}[0-9]$/, holds: "the element set number, right-aligned" },
];

const LINE2: Field[] = [
  { from: 1, to: 2, pattern: /^2 $/, holds: `"2 " (line number 2 and a space)` },
  { from: 3, to: 8, pattern: /^[0-9A-Z ][0-9 ]{3}[0-9] $/, holds: "the catalogue number, then a space" },
  { from: 9, to: 17, pattern: /^[ 0-9]{3}\.[0-9]{4} $/, holds: 'the inclination in deg with 4 decimals, e.g. " 97.4012", then a space' },
  { from: 18, to: 26, pattern: /^[ 0-9]{3}\.[0-9]{4} $/, holds: "the RAAN in deg with 4 decimals, then a space" },
  { from: 27, to: 34, pattern: /^[0-9][0-9 ]{6} $/, holds: 'the eccentricity as 7 digits after an assumed decimal point, e.g. "0012345", then a space' },
  { from: 35, to: 43, pattern: /^[ 0-9]{3}\.[0-9]{4} $/, holds: "the argument of perigee in deg with 4 decimals, then a space" },
  { from: 44, to: 52, pattern: /^[ 0-9]{3}\.[0-9]{4} $/, holds: "the mean anomaly in deg with 4 decimals, then a space" },
  { from: 53, to: 63, pattern: /^[ 0-9]{2}\.[0-9]{8}$/, holds: 'the mean motion in rev/day with 8 decimals, e.g. "15.21234567"' },
  { from: 64, to: 68, pattern: /^[ 0-9]{4}[0-9]$/, holds: "the revolution number at epoch, right-aligned" },
];

const cols = (f: { from: number; to: number }): string => (f.from === f.to ? `column ${f.from}` : `columns ${f.from}-${f.to}`);

/** The line with trailing spaces (and a carriage return) removed, or the error naming what is wrong. */
function readLine(parameter: string, which: 1 | 2, value: unknown): string | DomainError {
  if (typeof value !== "string") return badArgument(parameter, value, `line ${which} of a two-line element set as text (69 characters)`);
  const line = value.replace(/[\s]+$/, "");
  if (line.length !== 69)
    return badArgument(parameter, value, `line ${which} of a two-line element set: exactly 69 characters (this one has ${line.length} before any trailing spaces)`);
  return line;
}

function checkFields(parameter: string, which: 1 | 2, line: string, fields: Field[]): DomainError | undefined {
  for (const f of fields) {
    const text = line.slice(f.from - 1, f.to);
    if (!f.pattern.test(text)) return badArgument(parameter, text, `${cols(f)} of line ${which} to hold ${f.holds}`);
  }
  const sum = tleChecksum(line);
  if (String(sum) !== line[68])
    return badArgument(parameter, line[68], `column 69 of line ${which} to hold the checksum ${sum} (the sum of its digits, each minus sign counting 1, modulo 10): the line is mistyped or damaged`);
  return undefined;
}

/** "12345-3" style assumed-decimal field: mantissa 0.12345 times ten to the exponent. */
function assumedDecimal(text: string): number {
  const sign = text[0] === "-" ? -1 : 1;
  return sign * Number(`0.${text.slice(1, 6)}`) * 10 ** Number(text.slice(6, 8));
}

/**
 * The elements of a TLE pair, every column checked (see the file comment). Errors are #VALUE!
 * naming the line's parameter, the column range, what it received and what it should hold.
 */
export function parseTle(line1: unknown, line2: unknown, names: TleParameterNames = ["line1", "line2"]): Result<TleElements> {
  const l1 = readLine(names[0], 1, line1);
  if (typeof l1 !== "string") return l1;
  const l2 = readLine(names[1], 2, line2);
  if (typeof l2 !== "string") return l2;
  const bad = checkFields(names[0], 1, l1, LINE1) ?? checkFields(names[1], 2, l2, LINE2);
  if (bad) return bad;
  const number1 = l1.slice(2, 7).trim();
  const number2 = l2.slice(2, 7).trim();
  if (number1 !== number2)
    return badArgument(names[1], l2.slice(2, 7), `columns 3-7 of line 2 to hold the catalogue number of line 1, "${l1.slice(2, 7)}" (the two lines belong to different objects)`);

  const yy = Number(l1.slice(18, 20));
  const year = yy < 57 ? 2000 + yy : 1900 + yy;
  const day = Number(l1.slice(20, 32));
  const daysInYear = year % 4 === 0 ? 366 : 365;
  if (!(day >= 1 && day < daysInYear + 1))
    return badArgument(names[0], l1.slice(20, 32), `columns 21-32 of line 1 to hold a day of the year from 1 up to ${daysInYear + 1} (not included) for ${year}`);
  const angle = (text: string, max: number, name: string, columns: string): number | DomainError => {
    const v = Number(text);
    return v >= 0 && v <= max ? v : badArgument(names[1], text, `${columns} of line 2 to hold the ${name} in deg, from 0 to ${max}`);
  };
  const inclination = angle(l2.slice(8, 16), 180, "inclination", "columns 9-16");
  if (typeof inclination !== "number") return inclination;
  const raan = angle(l2.slice(17, 25), 360, "RAAN", "columns 18-25");
  if (typeof raan !== "number") return raan;
  const argp = angle(l2.slice(34, 42), 360, "argument of perigee", "columns 35-42");
  if (typeof argp !== "number") return argp;
  const meanAnomaly = angle(l2.slice(43, 51), 360, "mean anomaly", "columns 44-51");
  if (typeof meanAnomaly !== "number") return meanAnomaly;
  const meanMotion = Number(l2.slice(52, 63));
  if (!(meanMotion > 0)) return badArgument(names[1], l2.slice(52, 63), "columns 53-63 of line 2 to hold a positive mean motion in rev/day");
  return {
    catalogueNumber: number1,
    epoch: julianDateFromDayOfYear(year, day),
    inclination,
    raan,
    eccentricity: Number(`0.${l2.slice(26, 33).replace(/ /g, "0")}`),
    argp,
    meanAnomaly,
    meanMotion,
    bstar: assumedDecimal(l1.slice(53, 61)),
    ndot: Number(l1.slice(33, 43).replace(" ", "")),
    nddot: assumedDecimal(l1.slice(44, 52)),
  };
}

/**
 * [epoch (Julian date, UTC), inclination deg, RAAN deg, eccentricity, argument of perigee deg,
 * mean anomaly deg, mean motion rev/day, B* (1/Earth radii)] of a checked TLE pair. These are
 * SGP4 mean elements (Kozai mean motion): they are not osculating elements and give the right
 * orbit only through SGP4 (see tleState).
 */
export function tleElements(line1: unknown, line2: unknown): Result<number[]> {
  const t = parseTle(line1, line2);
  return isDomainError(t) ? t : [t.epoch, t.inclination, t.raan, t.eccentricity, t.argp, t.meanAnomaly, t.meanMotion, t.bstar];
}
