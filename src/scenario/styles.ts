/**
 * How a scenario sheet looks, in one place for both writers (the pane's Office.js writer and the
 * demo's exceljs writer): cell styles by role, the number formats, the colour scale's colours.
 * Colours as #RRGGBB.
 */
import type { CellRole } from "./types";

export interface RoleStyle {
  readonly fill?: string;
  readonly bold?: boolean;
  readonly italic?: boolean;
  readonly color?: string;
  readonly size?: number;
  /** Column headings wrap inside their column instead of running under the next one. */
  readonly wrap?: boolean;
  /** A thin line under the cell. */
  readonly underline?: boolean;
}

export const INPUT_FILL = "#FFF1C2";
export const NOTE_COLOUR = "#595F69";
const TITLE_COLOUR = "#1B3A5C";
const INPUT_TEXT = "#1A237E";

/** Cell styles by role: inputs stand out by fill (and the legend cell shows that fill). */
export const ROLE_STYLES: Readonly<Partial<Record<CellRole, RoleStyle>>> = {
  title: { bold: true, size: 14, color: TITLE_COLOUR },
  section: { bold: true, size: 12, color: TITLE_COLOUR },
  header: { bold: true, fill: "#E4E9F0", wrap: true, underline: true },
  input: { fill: INPUT_FILL, color: INPUT_TEXT },
  legend: { fill: INPUT_FILL, italic: true, color: INPUT_TEXT },
  note: { italic: true, color: NOTE_COLOUR },
  unit: { color: NOTE_COLOUR },
};

/** Colour scale of the transfer-window grid: the lowest values (the window) green, the middle pale yellow, the highest pale grey. */
export const WINDOW_SCALE = { low: "#4E9A6E", mid: "#F3E6A2", high: "#E9EDF2" } as const;

/** Number formats, by what the number is. */
export const FORMAT = {
  /** Distances from a centre, km. */
  km: "#,##0.000",
  /** Small offsets near a target, km (0.1 m). */
  kmNear: "0.0000",
  /** Speeds and delta-v, km/s (0.01 m/s). */
  kms: "0.00000",
  /** Speeds for a classroom table, km/s (1 m/s). */
  kmsShort: "0.000",
  /** Very small velocities near a target, km/s (0.1 mm/s). */
  kmsNear: "0.0000000",
  /** Delta-v in m/s. */
  ms: "#,##0.0",
  /** Delta-v in m/s, to the millimetre per second. */
  msFine: "#,##0.000",
  /** Metres. */
  m: "#,##0.00",
  kg: "#,##0.000",
  deg: "0.0000",
  degPerDay: "0.00000",
  ecc: "0.000000",
  seconds: "#,##0.0",
  minutes: "0.00",
  days: "0.00",
  wholeDays: "0",
  date: "yyyy-mm-dd",
  /** Date and time to the second (pass rises and sets). */
  dateTime: "yyyy-mm-dd hh:mm:ss",
  /** Slow decay rates, km/day (1 mm a day). */
  kmPerDay: "0.000000",
  /** Decibels. */
  decibels: "0.00",
  /** Frequencies, Hz. */
  hertz: "0.000E+00",
  c3: "0.00",
  /** Mass ratios and other plain ratios. */
  ratio: "0.00000",
  percent: "0.0%",
  wholePercent: "0%",
  integer: "0",
  oneDecimal: "0.0",
  twoDecimals: "0.00",
  thrust: "0.000",
  gm: "0.000000E+00",
  j2: "0.000000E+00",
  radius: "#,##0.0",
  /** Whole numbers with thousands separators (long times in s, large distances in km). */
  thousands: "#,##0",
} as const;

/**
 * Column width in points (what Office.js's format.columnWidth takes) for a width in Excel's
 * stored unit (what exceljs writes). ECMA-376 Part 1, §18.3.1.13 (col, width): a column's pixel
 * width is Truncate(((256 × width + Truncate(128 / w)) / 256) × w) with w the maximum digit width,
 * 7 px for the default 11 pt Calibri at 96 dpi (from memory); a pixel is 0.75 pt at 96 dpi.
 */
export function widthInPoints(width: number): number {
  const w = 7;
  const pixels = Math.trunc(((256 * width + Math.trunc(128 / w)) / 256) * w);
  return pixels * 0.75;
}
