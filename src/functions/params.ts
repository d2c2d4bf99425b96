import { badArgument, DomainError, type Result } from "../core/domain";
import { BODIES } from "../catalogue/bodies";
import { findBody } from "../catalogue/lookup";
import type { Body } from "../catalogue/types";
import { julianDateOfCell } from "./dates";
import type { Surface } from "./surface";

/**
 * Readers for the argument kinds a worksheet function takes. Each turns what Excel passes for
 * one case (a cell value; for vector kinds, one row of cells) into the value the core takes, or
 * a bad-argument error naming the parameter. Excel passes numbers, strings, booleans, null (an
 * omitted optional) and, inside ranges, 0 for blank cells.
 */
export type Cell = unknown;

/**
 * What a parameter stands for, where the adaptor checks it against the body (the surface check,
 * src/functions/surface.ts): "body" is the body itself; "radius" a distance from its centre;
 * "sma" a semi-major axis (checked when positive); "position" and "state" a vector whose first
 * three cells are a position from the centre; "body_radius" the override of the body's radius;
 * "date" a date (its example is written as DATE(...)).
 */
export type Role = "body" | "radius" | "sma" | "position" | "state" | "body_radius" | "date";

export interface Param<T = unknown> {
  readonly name: string;
  readonly optional: boolean;
  /** Cells one case takes across a row: 1 for scalars, 3 for a position, 6 for a state. */
  readonly width: number;
  /** Turns one case's cell (width 1) or row of cells (width > 1) into a value or an error. */
  readonly read: (cell: Cell) => T | DomainError;
  readonly role?: Role;
  /** A plain number reader: a finite number cell is taken as it is (the adaptor's fast path). */
  readonly plainNumber?: boolean;
  /** Body parameters: the body's surface when the cell names a catalogue body. */
  readonly surface?: (cell: Cell) => Surface | undefined;
  /**
   * Words offered as Excel AutoComplete suggestions: the closed set a choice() parameter takes,
   * or the usual words of a parameter that takes more (a body also takes a GM number).
   */
  readonly choices?: readonly Choice[];
}

/** One word of a closed set, with the tooltip that explains it. */
export interface Choice {
  readonly value: string;
  readonly tooltip: string;
}

/** A body argument: a catalogue entry, or a bare GM in km^3/s^2. */
export type BodyArg = Body | number;

const isOmitted = (cell: Cell): boolean => cell === null || cell === undefined || cell === "";

function readNumber(name: string, cell: Cell, allowed: string): number | DomainError {
  if (typeof cell === "number") return Number.isFinite(cell) ? cell : badArgument(name, cell, allowed);
  return badArgument(name, cell, allowed);
}

/** A required number; `unit` goes into the message ("a number of km"). */
export function num(name: string, unit = ""): Param<number> {
  const allowed = unit ? `a number (${unit})` : "a number";
  return { name, optional: false, width: 1, plainNumber: true, read: (c) => (isOmitted(c) ? badArgument(name, c, allowed + ", which is required") : readNumber(name, c, allowed)) };
}

/** An optional number: null when omitted or blank. */
export function optNum(name: string, unit = ""): Param<number | null> {
  const allowed = unit ? `a number (${unit}) or nothing` : "a number or nothing";
  const role: Role | undefined = name === "body_radius" ? "body_radius" : undefined;
  return { name, optional: true, width: 1, plainNumber: true, role, read: (c) => (isOmitted(c) ? null : readNumber(name, c, allowed)) };
}

/**
 * A number that may be left out even though parameters after it are required (custom-functions
 * metadata lists a parameter as optional only after the required ones): an omitted or blank
 * cell reads as `fallback`, e.g. a circular orbit's eccentricity 0.
 */
export function numOr(name: string, fallback: number, unit = ""): Param<number> {
  const allowed = unit ? `a number (${unit}), or nothing for ${fallback}` : `a number, or nothing for ${fallback}`;
  return { name, optional: false, width: 1, plainNumber: true, read: (c) => (isOmitted(c) ? fallback : readNumber(name, c, allowed)) };
}

/**
 * A date: an Excel date serial (1900 date system) or ISO 8601 text, read as UTC, given to the
 * core as a Julian date (src/functions/dates.ts).
 */
export function date(name: string): Param<number> {
  return { name, optional: false, width: 1, role: "date", read: (c) => (isOmitted(c) ? badArgument(name, c, "a date (an Excel date serial or ISO 8601 text), which is required") : julianDateOfCell(name, c)) };
}

/** An optional date: null when omitted or blank. */
export function optDate(name: string): Param<number | null> {
  return { name, optional: true, width: 1, role: "date", read: (c) => (isOmitted(c) || c === 0 ? null : julianDateOfCell(name, c)) };
}

/** A distance from the body's centre, km: refused below the body's surface (src/functions/surface.ts). */
export const radius = (name: string): Param<number> => ({ ...num(name, "km"), role: "radius" });

/** An optional distance from the body's centre, km, checked like `radius` when given. */
export const optRadius = (name: string): Param<number | null> => ({ ...optNum(name, "km"), role: "radius" });

/** A semi-major axis, km: a positive one below the body's surface is refused (no orbit of that size clears the body). */
export const sma = (name = "sma"): Param<number> => ({ ...num(name, "km"), role: "sma" });

/** An optional TRUE/FALSE (1/0 accepted as Excel does); false when omitted. */
export function flag(name: string): Param<boolean> {
  return {
    name,
    optional: true,
    width: 1,
    read: (c) => {
      if (isOmitted(c)) return false;
      if (typeof c === "boolean") return c;
      if (c === 0 || c === 1) return c === 1;
      return badArgument(name, c, "TRUE or FALSE");
    },
  };
}

/** Required text (trimmed); `allowed` describes the accepted words for the message. */
export function text(name: string, allowed = "text"): Param<string> {
  return {
    name,
    optional: false,
    width: 1,
    read: (c) => (typeof c === "string" && c.trim() !== "" ? c.trim() : badArgument(name, c, allowed)),
  };
}

/**
 * One word of a closed set, matched case-insensitively and given to the core in its listed
 * spelling; `fallback` is what an omitted optional choice means (undefined: the choice is required).
 */
export function choice(name: string, choices: readonly Choice[], fallback?: string): Param<string> {
  const byWord = new Map(choices.map((c) => [c.value.toLowerCase(), c.value]));
  const allowed = `one of ${choices.map((c) => `"${c.value}"`).join(", ")}`;
  return {
    name,
    optional: fallback !== undefined,
    width: 1,
    choices,
    read: (c) => {
      if (isOmitted(c)) return fallback ?? badArgument(name, c, `${allowed}, which is required`);
      const word = typeof c === "string" ? byWord.get(c.trim().toLowerCase()) : undefined;
      return word ?? badArgument(name, c, allowed);
    },
  };
}

/**
 * The same parameter, with words to offer as AutoComplete suggestions; what it reads is
 * unchanged (for parameters that accept more than the words: synonyms, or a number).
 */
export const suggesting = <T>(p: Param<T>, choices: readonly Choice[]): Param<T> => ({ ...p, choices });

/** Optional text: null when omitted. */
export function optText(name: string, allowed = "text"): Param<string | null> {
  return {
    name,
    optional: true,
    width: 1,
    read: (c) => (isOmitted(c) ? null : typeof c === "string" ? c.trim() : badArgument(name, c, allowed)),
  };
}

/** The surface of the catalogue body a cell names (its equatorial radius), if it names one. */
function surfaceOf(c: Cell): Surface | undefined {
  if (typeof c !== "string") return undefined;
  const b = findBody(c);
  return b instanceof DomainError ? undefined : { name: b.name, radius: b.equatorialRadius.value };
}

/** What each catalogue body is, as the tooltip of its name's suggestion. */
function bodyTooltip(b: (typeof BODIES)[number]): string {
  if (b.parent === null) return `The ${b.kind}: GM, radius and rotation from the catalogue.`;
  const about = b.kind === "moon" ? `Moon of ${b.parent}` : `${b.kind[0].toUpperCase()}${b.kind.slice(1)} orbiting the ${b.parent}`;
  return `${about}: GM, radius${b.j2 ? ", J2" : ""} and orbit from the catalogue.`;
}

/** The catalogue's names, offered as suggestions for every body parameter (a GM number is accepted as well). */
export const BODY_CHOICES: readonly Choice[] = BODIES.map((b) => ({ value: b.name, tooltip: bodyTooltip(b) }));

/**
 * A GM given as text: Excel hands a number cell to a text-typed parameter (one with
 * AutoComplete suggestions) as its text, so "398600.4418" is the number 398600.4418.
 */
const NUMERIC_TEXT = /^\s*[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?\s*$/i;

/** A body: a catalogue name (case-insensitive) or a positive GM in km^3/s^2 (a number, or a number as text). */
export function body(name = "body"): Param<BodyArg> {
  const allowed = "a catalogue body name (e.g. \"Earth\") or a positive GM in km3/s2";
  const gmNumber = (c: unknown, v: number) => (v > 0 && Number.isFinite(v) ? v : badArgument(name, c, allowed));
  return {
    name,
    optional: false,
    width: 1,
    role: "body",
    surface: surfaceOf,
    choices: BODY_CHOICES,
    read: (c) => {
      if (typeof c === "string") return c.trim() === "" ? badArgument(name, c, allowed) : NUMERIC_TEXT.test(c) ? gmNumber(c, Number(c)) : findBody(c, name);
      if (typeof c === "number") return gmNumber(c, c);
      return badArgument(name, c, allowed);
    },
  };
}

/**
 * A body read as its GM in km^3/s^2 (the catalogue body's own GM, without moons, or the number
 * given), so a core function that takes GM first is passed directly.
 */
export function gm(name = "body"): Param<number> {
  const inner = body(name);
  return {
    ...inner,
    read: (c) => {
      const b = inner.read(c);
      return typeof b === "number" || b instanceof DomainError ? b : b.gm.value;
    },
  };
}

/** An optional body (null when omitted). */
export function optBody(name: string): Param<BodyArg | null> {
  const inner = body(name);
  return { name, optional: true, width: 1, choices: inner.choices, read: (c) => (isOmitted(c) ? null : inner.read(c)) };
}

/** A row of `width` numbers per case (a position has 3, a state 6); `what` names the columns. */
export function vec(name: string, width: number, what: string, role?: Role): Param<number[]> {
  return {
    name,
    optional: false,
    width,
    role,
    read: (c) => {
      if (!Array.isArray(c)) return badArgument(name, c, `${width} numbers in a row (${what}), which are required`);
      const row = c as Cell[];
      const out = new Array<number>(width);
      for (let k = 0; k < width; k++) {
        const v = row[k];
        if (typeof v !== "number" || !Number.isFinite(v)) return badArgument(name, v, `${width} numbers in a row (${what}); item ${k + 1} is not a number`);
        out[k] = v;
      }
      return out;
    },
  };
}

/** Header labels of a state vector's six columns, wherever a function returns one. */
export const STATE_LABELS: readonly string[] = ["x (km)", "y (km)", "z (km)", "vx (km/s)", "vy (km/s)", "vz (km/s)"];

/** A state vector: six numbers in a row per case. */
export const state = (name = "state"): Param<number[]> => vec(name, 6, "x, y, z in km and vx, vy, vz in km/s", "state");

/** A position from the body's centre: three numbers in a row per case, km. */
export const position = (name: string): Param<number[]> => vec(name, 3, "x, y, z in km", "position");

/**
 * A whole range read as one list (not lifted case by case): for arguments that are lists by
 * nature, such as the burns of a sequence. Blank cells at the end of the range are dropped.
 */
export interface ListParam<T> {
  readonly name: string;
  readonly optional: boolean;
  readonly list: true;
  readonly read: (cells: Cell[]) => T | DomainError;
}

export function list<T>(name: string, optional: boolean, read: (cells: Cell[], name: string) => T | DomainError): ListParam<T> {
  return { name, optional, list: true, read: (cells) => read(cells, name) };
}

/** List reader: every cell a finite number. */
export function numbers(cells: Cell[], name: string): number[] | DomainError {
  const out: number[] = [];
  for (const c of cells) {
    if (typeof c !== "number" || !Number.isFinite(c)) return badArgument(name, c, "a range of numbers");
    out.push(c);
  }
  return out;
}

/** List reader: every cell a non-empty text. */
export function texts(cells: Cell[], name: string): string[] | DomainError {
  const out: string[] = [];
  for (const c of cells) {
    if (typeof c !== "string" || c.trim() === "") return badArgument(name, c, "a range of names (text)");
    out.push(c.trim());
  }
  return out;
}

export type { Result };
