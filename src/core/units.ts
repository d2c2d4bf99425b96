import { toDegrees, toRadians } from "./angles";
import { badArgument, finite, finiteResult, isDomainError, type DomainError, type Result } from "./domain";

/**
 * Conversion between the trade's units (CONVERT_UNIT). Each unit is an exact whole-number factor
 * to a base unit of its quantity; the conversion is value * factor(from) / factor(to), two correctly
 * rounded operations, so it is exact whenever the true result is representable (km -> m,
 * au -> km for whole numbers) and within two roundings (1.5 |x| eps) otherwise. Angles are counted in arcseconds
 * (deg 3600, arcmin 60, arcsec 1: exact factors), and radians go through toRadians /
 * toDegrees, the same conversion the rest of the core uses.
 * Definitions: au = 149 597 870 700 m exactly (IAU 2012 Resolution B2); day = 86 400 s;
 * yr = Julian year, 365.25 days = 31 557 600 s (IAU); min = 60 s; h = 3600 s; ft = 0.3048 m,
 * mi = 1609.344 m and lb = 0.45359237 kg exactly (the international yard and pound, 1959);
 * nmi = 1852 m exactly (the international nautical mile, 1929); km/h = 1/3.6 m/s.
 * Unit names are case-insensitive; surrounding spaces are ignored; each unit also takes the
 * spellings people type (day, days, d; h, hr, hour; km3/s2, km^3/s^2, km³/s² ...).
 */

/** Astronomical unit, km: 149 597 870 700 m exactly (IAU 2012 Resolution B2); the one definition in the core. */
export const AU_KM = 149597870.7;

type Quantity = "length" | "time" | "speed" | "gravitational parameter" | "angle" | "mass";

interface Unit {
  /** The name the messages and the help use. */
  name: string;
  quantity: Quantity;
  /**
   * Factor to the quantity's base unit, chosen so that every factor is a whole number, exact in
   * float64: length 0.1 mm, time s, speed m/h, GM m3/s2, angle arcsec, mass 10 micrograms. rad
   * has none: see convertUnit.
   */
  factor: number;
  /** Other spellings accepted (lower case). */
  aliases: readonly string[];
}

const UNIT_LIST: readonly Unit[] = [
  { name: "km", quantity: "length", factor: 1e7, aliases: ["kilometre", "kilometres", "kilometer", "kilometers"] },
  { name: "m", quantity: "length", factor: 1e4, aliases: ["metre", "metres", "meter", "meters"] },
  { name: "au", quantity: "length", factor: 1.495978707e15, aliases: ["astronomical unit", "astronomical units"] }, // AU_KM in tenths of a millimetre, exact in float64
  { name: "ft", quantity: "length", factor: 3048, aliases: ["foot", "feet"] },
  { name: "mi", quantity: "length", factor: 16093440, aliases: ["mile", "miles", "statute mile", "statute miles"] },
  { name: "nmi", quantity: "length", factor: 18520000, aliases: ["nautical mile", "nautical miles"] },
  { name: "s", quantity: "time", factor: 1, aliases: ["sec", "secs", "second", "seconds"] },
  { name: "min", quantity: "time", factor: 60, aliases: ["mins", "minute", "minutes"] },
  { name: "h", quantity: "time", factor: 3600, aliases: ["hr", "hrs", "hour", "hours"] },
  { name: "day", quantity: "time", factor: 86400, aliases: ["d", "days"] },
  { name: "yr", quantity: "time", factor: 31557600, aliases: ["yrs", "year", "years", "julian year", "julian years"] },
  { name: "km/s", quantity: "speed", factor: 3.6e6, aliases: ["kps"] },
  { name: "m/s", quantity: "speed", factor: 3600, aliases: [] },
  { name: "km/h", quantity: "speed", factor: 1000, aliases: ["kph", "kmh"] },
  { name: "km3/s2", quantity: "gravitational parameter", factor: 1e9, aliases: ["km^3/s^2", "km³/s²", "km3 s-2", "km3/s^2"] },
  { name: "m3/s2", quantity: "gravitational parameter", factor: 1, aliases: ["m^3/s^2", "m³/s²", "m3 s-2", "m3/s^2"] },
  { name: "deg", quantity: "angle", factor: 3600, aliases: ["°", "degree", "degrees"] },
  { name: "rad", quantity: "angle", factor: NaN, aliases: ["radian", "radians"] },
  { name: "arcmin", quantity: "angle", factor: 60, aliases: ["′", "arcminute", "arcminutes"] },
  { name: "arcsec", quantity: "angle", factor: 1, aliases: ["″", "arcsecond", "arcseconds"] },
  { name: "kg", quantity: "mass", factor: 1e8, aliases: ["kilogram", "kilograms", "kgs"] },
  { name: "lb", quantity: "mass", factor: 45359237, aliases: ["lbs", "pound", "pounds"] },
];

const BY_NAME = new Map<string, Unit>();
for (const u of UNIT_LIST) for (const n of [u.name, ...u.aliases]) BY_NAME.set(n, u);

const QUANTITIES: readonly Quantity[] = ["length", "time", "speed", "gravitational parameter", "angle", "mass"];

const namesOf = (quantity: Quantity): string[] => UNIT_LIST.filter((u) => u.quantity === quantity).map((u) => u.name);

/** The units the help and the AutoComplete suggestions offer, with what each is. */
export const UNIT_CHOICES: readonly { value: string; tooltip: string }[] = UNIT_LIST.map((u) => ({
  value: u.name,
  tooltip: `${u.quantity[0].toUpperCase()}${u.quantity.slice(1)}${u.aliases.length > 0 ? `; also written ${u.aliases.slice(0, 3).join(", ")}` : ""}.`,
}));

/** Every accepted unit, quantity by quantity, for messages and help: "length km, m, au, ...; time s, ...". */
export const UNIT_NAMES = QUANTITIES.map((q) => `${q} ${namesOf(q).join(", ")}`).join("; ");

/** A few other spellings a quantity's units are read in, for messages. */
const spellings = (quantity: Quantity): string =>
  `other spellings are read too, such as ${UNIT_LIST.filter((u) => u.quantity === quantity && u.aliases.length > 0)
    .slice(0, 3)
    .map((u) => u.aliases[0])
    .join(", ")}`;

/** What a unit parameter takes, for messages. */
export const UNIT_ALLOWED = `a unit name: ${UNIT_NAMES} (other spellings are read too, such as days, hr, km^3/s^2)`;

function lookUp(parameter: string, name: unknown, quantity?: Quantity): Unit | DomainError {
  const unit = typeof name === "string" ? BY_NAME.get(name.trim().toLowerCase().replace(/\s+/g, " ")) : undefined;
  if (unit) return unit;
  return quantity
    ? badArgument(parameter, name, `a unit of ${quantity}: one of ${namesOf(quantity).join(", ")} (${spellings(quantity)})`)
    : badArgument(parameter, name, UNIT_ALLOWED);
}

/** Converts `value` from unit `from` to unit `to` (see the list above). */
export function convertUnit(value: number, from: unknown, to: unknown): Result<number> {
  const badValue = finite("value", value);
  if (badValue) return badValue;
  const source = lookUp("from", from);
  if (isDomainError(source)) return source;
  const target = lookUp("to", to, source.quantity);
  if (isDomainError(target)) return target;
  if (source.quantity !== target.quantity)
    return badArgument("to", to, `a unit of ${source.quantity} like "${source.name}": one of ${namesOf(source.quantity).join(", ")}`);
  if (source === target) return value;
  // Radians: through degrees, with the core's own toRadians / toDegrees.
  if (source.name === "rad") return finiteResult("value", target.name === "deg" ? toDegrees(value) : (toDegrees(value) * 3600) / target.factor);
  if (target.name === "rad") return source.name === "deg" ? toRadians(value) : toRadians((value * source.factor) / 3600);
  return finiteResult("value", (value * source.factor) / target.factor);
}
