import { RAD_PER_DEG, toDegrees, toRadians } from "./angles";
import { badArgument, finite, finiteResult, isDomainError, type DomainError, type Result } from "./domain";

/**
 * Conversion between the trade's units (CONVERT_UNIT). Each unit is an exact factor to a base
 * unit of its quantity; the conversion is value * factor(from) / factor(to), two correctly
 * rounded operations, so it is exact whenever the true result is representable (km -> m,
 * au -> km for whole numbers) and within 1 ulp otherwise. Angles go through toRadians /
 * toDegrees, the same conversion the rest of the core uses.
 * Definitions: au = 149 597 870 700 m exactly (IAU 2012 Resolution B2); day = 86 400 s;
 * yr = Julian year, 365.25 days = 31 557 600 s (IAU); min = 60 s; h = 3600 s.
 * Unit names are case-insensitive; surrounding spaces are ignored.
 */

/** Astronomical unit, km: 149 597 870 700 m exactly (IAU 2012 Resolution B2); the one definition in the core. */
export const AU_KM = 149597870.7;

type Quantity = "length" | "time" | "speed" | "gravitational parameter" | "angle";

interface Unit {
  quantity: Quantity;
  /** Factor to the quantity's base unit (m, s, m/s, m3/s2, rad); exact except deg (pi/180). */
  factor: number;
}

const UNITS: Readonly<Record<string, Unit>> = {
  km: { quantity: "length", factor: 1000 },
  m: { quantity: "length", factor: 1 },
  au: { quantity: "length", factor: AU_KM * 1000 }, // exactly 149597870700 in float64
  s: { quantity: "time", factor: 1 },
  min: { quantity: "time", factor: 60 },
  h: { quantity: "time", factor: 3600 },
  day: { quantity: "time", factor: 86400 },
  yr: { quantity: "time", factor: 31557600 },
  "km/s": { quantity: "speed", factor: 1000 },
  "m/s": { quantity: "speed", factor: 1 },
  km3s2: { quantity: "gravitational parameter", factor: 1e9 },
  m3s2: { quantity: "gravitational parameter", factor: 1 },
  deg: { quantity: "angle", factor: RAD_PER_DEG },
  rad: { quantity: "angle", factor: 1 },
};

/** The names as a sheet user types them, for messages. */
const DISPLAY_NAMES: Readonly<Record<string, string>> = { km3s2: "km3/s2", m3s2: "m3/s2" };

const display = (key: string): string => DISPLAY_NAMES[key] ?? key;

const keyOf = (name: string): string => {
  const k = name.trim().toLowerCase();
  return k === "km3/s2" ? "km3s2" : k === "m3/s2" ? "m3s2" : k;
};

/** Every accepted unit name as the sheet writes it, comma-separated, for messages and help. */
export const UNIT_NAMES = Object.keys(UNITS).map(display).join(", ");

const unitsOf = (quantity: Quantity): string =>
  Object.keys(UNITS)
    .filter((k) => UNITS[k].quantity === quantity)
    .map(display)
    .join(", ");

function lookUp(parameter: string, name: unknown): Unit | DomainError {
  const unit = typeof name === "string" ? UNITS[keyOf(name)] : undefined;
  return unit ?? badArgument(parameter, name, `a unit name, one of ${UNIT_NAMES}`);
}

/** Converts `value` from unit `from` to unit `to` (see the list above). */
export function convertUnit(value: number, from: unknown, to: unknown): Result<number> {
  const badValue = finite("value", value);
  if (badValue) return badValue;
  const source = lookUp("from", from);
  if (isDomainError(source)) return source;
  const target = lookUp("to", to);
  if (isDomainError(target)) return target;
  if (source.quantity !== target.quantity)
    return badArgument("to", to, `a unit of ${source.quantity} like "${from as string}": one of ${unitsOf(source.quantity)}`);
  if (source === target) return value;
  if (source.quantity === "angle") return source === UNITS.deg ? toRadians(value) : toDegrees(value);
  return finiteResult("value", (value * source.factor) / target.factor);
}
