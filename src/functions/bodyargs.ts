import { badArgument, isDomainError, noAnswer, positive, withAll, type Result } from "../core/domain";
import { findBody } from "../catalogue/lookup";
import type { Body, Sourced } from "../catalogue/types";
import type { BodyArg } from "./params";
import type { Surface } from "./surface";

/**
 * What a function needs of its body argument: the catalogue value, or the override the sheet
 * gives. An override wins when given; a numeric body (a bare GM) has no catalogue values, so the
 * override is then required and its absence is a bad argument that names the override.
 */
export const gmOf = (b: BodyArg): number => (typeof b === "number" ? b : b.gm.value);

/** GM for heliocentric work: the system GM (planet with its moons) where the catalogue has one. */
export const systemGmOf = (b: BodyArg): number => (typeof b === "number" ? b : (b.systemGm ?? b.gm).value);

export function bodyValue(
  b: BodyArg,
  override: number | null,
  overrideName: string,
  pick: (body: Body) => Sourced | undefined,
  what: string,
): Result<number> {
  if (override !== null) return positive(overrideName, override, what) ?? override;
  if (typeof b === "number")
    return badArgument(overrideName, null, `${what}: required when body is given as a GM number`);
  const v = pick(b);
  if (v === undefined) return badArgument(overrideName, null, `${what}: the catalogue has none for ${b.name}, so give it`);
  return v.value;
}

/** Reference (equatorial) radius, km: the radius altitudes are measured from. */
export const radiusOf = (b: BodyArg, override: number | null = null): Result<number> =>
  bodyValue(b, override, "body_radius", (x) => x.equatorialRadius, "a body radius in km");

/** Mean (volumetric) radius, km: the sphere for surface distances. */
export const meanRadiusOf = (b: BodyArg, override: number | null = null): Result<number> =>
  bodyValue(b, override, "body_radius", (x) => x.meanRadius, "a body radius in km");

/** J2 with the radius it is referred to; both from the catalogue unless overridden. */
export function j2Of(b: BodyArg, j2Override: number | null): Result<number> {
  return bodyValue(b, j2Override, "j2", (x) => x.j2, "a J2 value (dimensionless)");
}

/** Radius for J2 formulas: the J2 model's own reference radius, else the equatorial radius. */
export const j2RadiusOf = (b: BodyArg, override: number | null = null): Result<number> =>
  bodyValue(b, override, "body_radius", (x) => x.j2ReferenceRadius ?? x.equatorialRadius, "a body radius in km");

/** Sidereal rotation period, s (negative for retrograde spin). */
export function rotationPeriodOf(b: BodyArg, override: number | null): Result<number> {
  if (override !== null)
    return Number.isFinite(override) && override !== 0 ? override : badArgument("rotation_period", override, "a nonzero sidereal rotation period in s (negative for retrograde spin)");
  if (typeof b === "number") return badArgument("rotation_period", null, "a sidereal rotation period in s: required when body is given as a GM number");
  return b.rotationPeriod?.value ?? badArgument("rotation_period", null, `a sidereal rotation period in s: the catalogue has none for ${b.name}, so give it`);
}

/** The catalogue body a body orbits, for functions that work about the parent (SOI, Hill radius). */
export function parentOf(b: BodyArg, parameter = "body"): Result<Body> {
  if (typeof b === "number") return badArgument(parameter, b, "a catalogue body name: a bare GM number has no parent or orbit in the catalogue");
  if (b.parent === null) return noAnswer(parameter, `${b.name} orbits no parent body in the catalogue`);
  return findBody(b.parent, parameter);
}

/** The body's orbit about its parent from the catalogue. */
export function orbitOf(b: BodyArg, parameter = "body"): Result<NonNullable<Body["orbit"]>> {
  if (typeof b === "number") return badArgument(parameter, b, "a catalogue body name: a bare GM number has no orbit in the catalogue");
  return b.orbit ?? noAnswer(parameter, `the catalogue has no orbit for ${b.name}`);
}

/**
 * Orbital period about the star of the planet the body is or belongs to (a moon's planet's
 * period): the year a sun-synchronous node must keep pace with.
 */
export function starPeriodOf(b: BodyArg, override: number | null): Result<number> {
  if (override !== null) return positive("body_orbital_period", override, "s") ?? override;
  if (typeof b === "number") return badArgument("body_orbital_period", null, "the body's orbital period about the Sun in s: required when body is given as a GM number");
  let x: Body = b;
  while (x.parent !== null && x.parent.toLowerCase() !== "sun") {
    const p = findBody(x.parent);
    if (isDomainError(p)) return p;
    x = p;
  }
  if (x.parent === null) return badArgument("body", b.name, `a planet or moon: ${b.name} orbits no star, and a sun-synchronous plane keeps its angle to the star the body orbits`);
  return x.orbit?.period.value ?? badArgument("body_orbital_period", null, `the orbital period of ${x.name} in s: the catalogue has none, so give it`);
}

/**
 * The catalogue body two bodies both orbit (synodic periods, planet-to-planet transfers); a
 * second body about another parent is a bad argument naming `parameterB`.
 */
export function sharedParentOf(a: BodyArg, b: BodyArg, parameterA: string, parameterB: string): Result<Body> {
  return withAll([parentOf(a, parameterA), parentOf(b, parameterB)], (pa, pb) =>
    pa === pb ? pa : badArgument(parameterB, (b as Body).name, `a body orbiting ${pa.name}, as ${parameterA} (${(a as Body).name}) does; ${(b as Body).name} orbits ${pb.name}`),
  );
}

/**
 * The surface the checks of src/functions/surface.ts compare with: the body_radius given, else a
 * catalogue body's equatorial radius; null for a bare GM without body_radius, which says nothing
 * about the surface.
 */
export function surfaceOf(b: BodyArg, bodyRadius: number | null = null): Surface | null {
  if (bodyRadius !== null && bodyRadius > 0) return { name: typeof b === "number" ? "the body" : b.name, radius: bodyRadius };
  return typeof b === "number" ? null : { name: b.name, radius: b.equatorialRadius.value };
}
