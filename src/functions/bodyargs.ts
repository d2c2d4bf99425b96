import { badArgument, positive, type Result } from "../core/domain";
import type { Body, Sourced } from "../catalogue/types";
import type { BodyArg } from "./params";

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
