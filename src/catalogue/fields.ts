import { badArgument, isDomainError, noAnswer, type Result } from "../core/domain";
import { findBody } from "./lookup";
import { SOURCES } from "./sources";
import type { Body, Sourced } from "./types";

/**
 * The catalogue fields a sheet can ask for by BODY_VALUE(body, field) and BODY_TABLE([fields],
 * [bodies]). Keys are lower_snake and matched case-insensitively. Numeric fields return the
 * catalogue's Sourced value in sheet units; `parent` and `kind` return text.
 */
export interface BodyField {
  /** lower_snake key the sheet types, e.g. "equatorial_radius". */
  key: string;
  /** Column label for tables, e.g. "Equatorial radius". */
  label: string;
  /** Sheet unit ("" for dimensionless numbers and text). */
  unit: string;
  /** What the value is, for the function guide. */
  description: string;
  /** The sourced number, or text for parent/kind; undefined where the catalogue has none. */
  get: (b: Body) => Sourced | string | undefined;
  /** Source of a text field (numeric fields carry their own in the Sourced). */
  textSource?: (b: Body) => string | undefined;
}

export const BODY_FIELDS: readonly BodyField[] = [
  { key: "gm", label: "GM", unit: "km3/s2", description: "gravitational parameter of the body alone", get: (b) => b.gm },
  {
    key: "system_gm",
    label: "System GM",
    unit: "km3/s2",
    description: "GM of the body with its moons (Earth: the Earth-Moon barycentre); equals GM for a body without moons",
    get: (b) => b.systemGm ?? b.gm,
  },
  { key: "equatorial_radius", label: "Equatorial radius", unit: "km", description: "equatorial radius (longest semi-axis of a triaxial body)", get: (b) => b.equatorialRadius },
  { key: "mean_radius", label: "Mean radius", unit: "km", description: "mean (volumetric) radius", get: (b) => b.meanRadius },
  { key: "polar_radius", label: "Polar radius", unit: "km", description: "semi-axis along the spin axis", get: (b) => b.polarRadius },
  { key: "j2", label: "J2", unit: "", description: "unnormalised zonal harmonic J2 (goes with j2_reference_radius)", get: (b) => b.j2 },
  { key: "j2_reference_radius", label: "J2 reference radius", unit: "km", description: "radius the J2 value is referred to", get: (b) => b.j2ReferenceRadius },
  { key: "rotation_period", label: "Rotation period", unit: "s", description: "sidereal rotation period, negative for retrograde spin", get: (b) => b.rotationPeriod },
  {
    key: "parent",
    label: "Parent",
    unit: "",
    description: "the body it orbits",
    get: (b) => b.parent ?? undefined,
    textSource: (b) => b.orbit?.sma.source,
  },
  { key: "kind", label: "Kind", unit: "", description: "star, planet, dwarf planet, moon or asteroid", get: (b) => b.kind, textSource: () => "IAU2006" },
  { key: "sma", label: "Semi-major axis", unit: "km", description: "semi-major axis of the orbit about the parent", get: (b) => b.orbit?.sma },
  { key: "ecc", label: "Eccentricity", unit: "", description: "eccentricity of the orbit about the parent", get: (b) => b.orbit?.ecc },
  { key: "inc", label: "Inclination", unit: "deg", description: "inclination to the source's reference plane (ecliptic or Laplace plane)", get: (b) => b.orbit?.inc },
  { key: "orbital_period", label: "Orbital period", unit: "s", description: "sidereal period of the orbit about the parent", get: (b) => b.orbit?.period },
  {
    key: "ellipsoid_semi_major_axis",
    label: "Ellipsoid semi-major axis",
    unit: "km",
    description: "semi-major axis of the reference ellipsoid the ground functions use (Earth: WGS 84)",
    get: (b) => b.ellipsoid?.semiMajorAxis,
  },
  { key: "ellipsoid_inverse_flattening", label: "Ellipsoid 1/f", unit: "", description: "inverse flattening 1/f of the reference ellipsoid (Earth: WGS 84)", get: (b) => b.ellipsoid?.inverseFlattening },
  { key: "ellipsoid_gm", label: "Ellipsoid GM", unit: "km3/s2", description: "GM of the reference ellipsoid's model (Earth: WGS 84, with the atmosphere)", get: (b) => b.ellipsoid?.gm },
  { key: "ellipsoid_rotation_rate", label: "Ellipsoid rotation rate", unit: "rad/s", description: "angular velocity of the reference ellipsoid (Earth: WGS 84)", get: (b) => b.ellipsoid?.rotationRate },
  { key: "ellipsoid_j2", label: "Ellipsoid J2", unit: "", description: "J2 of the reference ellipsoid's gravity model (Earth: WGS 84), the J2 of the ground functions", get: (b) => b.ellipsoid?.j2 },
];

const byKey = new Map(BODY_FIELDS.map((f) => [f.key, f]));

/** Every field key, in catalogue order. */
export const fieldKeys = (): string[] => BODY_FIELDS.map((f) => f.key);

/** Table header for a field: label with its unit, e.g. "Mean radius (km)". */
export const fieldHeader = (f: BodyField): string => (f.unit ? `${f.label} (${f.unit})` : f.label);

/** Case-insensitive field lookup; an unknown key is a bad argument listing every valid key. */
export function findField(field: unknown, parameter = "field"): Result<BodyField> {
  const found = typeof field === "string" ? byKey.get(field.trim().toLowerCase()) : undefined;
  return found ?? badArgument(parameter, field, `one of the field names ${fieldKeys().join(", ")}`);
}

const asBody = (body: Body | string): Result<Body> => (typeof body === "string" ? findBody(body, "body") : body);

/** "Mean radius" → "mean radius", but "J2" and "GM" keep their capitals. */
const noun = (label: string): string => (/^[A-Z][a-z]/.test(label) ? label[0].toLowerCase() + label.slice(1) : label);

const lacking = (b: Body, f: BodyField, parameter: string) =>
  noAnswer(parameter, `the catalogue has no ${noun(f.label)} for ${b.name}`);

/** The catalogue entry behind BODY_VALUE: the Sourced number, or text for parent/kind. */
export function bodyFieldEntry(body: Body | string, field: string, parameter = "field"): Result<Sourced | string> {
  const b = asBody(body);
  if (isDomainError(b)) return b;
  const f = findField(field, parameter);
  if (isDomainError(f)) return f;
  return f.get(b) ?? lacking(b, f, parameter);
}

/**
 * BODY_VALUE(body, field): the value in sheet units (number), or text for parent and kind.
 * Unknown field → #VALUE! listing the keys; a field the body lacks → #N/A saying so.
 */
export function bodyFieldValue(body: Body | string, field: string, parameter = "field"): Result<number | string> {
  const e = bodyFieldEntry(body, field, parameter);
  if (isDomainError(e)) return e;
  return typeof e === "string" ? e : e.value;
}

/** Short citation label (SOURCES[...].label) of the value BODY_VALUE(body, field) returns. */
export function bodySourceFor(body: Body | string, field: string, parameter = "field"): Result<string> {
  const b = asBody(body);
  if (isDomainError(b)) return b;
  const f = findField(field, parameter);
  if (isDomainError(f)) return f;
  const entry = f.get(b);
  if (entry === undefined) return lacking(b, f, parameter);
  const key = typeof entry === "string" ? f.textSource?.(b) : entry.source;
  const source = key === undefined ? undefined : SOURCES[key];
  return source ? source.label : noAnswer(parameter, `the catalogue cites no source for ${f.key} of ${b.name}`);
}
