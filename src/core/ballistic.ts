import { finiteResult, firstError, positive, type Result } from "./domain";

/**
 * Ballistic coefficient B = m / (C_D A), kg/m^2: mass over drag coefficient times the area
 * presented to the flow. A larger B (dense, small) decays more slowly. Every drag function in
 * the core takes B in this form; some texts define the inverse, C_D A / m (m^2/kg), so check a
 * quoted value's unit before using it.
 *
 * Default C_D = 2.2 (common practice for a tumbling or flat-plate small satellite in free
 * molecular flow; real values run from about 2 to 2.6 with shape, attitude and gas-surface
 * interaction). Exact in float64 to a few ulp.
 */
export const DEFAULT_DRAG_COEFFICIENT = 2.2;

export function ballisticCoefficient(mass: number, dragArea: number, dragCoefficient: number | null): Result<number> {
  const cd = dragCoefficient ?? DEFAULT_DRAG_COEFFICIENT;
  const bad = firstError(positive("mass", mass, "kg"), positive("drag_area", dragArea, "m2"), positive("drag_coefficient", cd, "(dimensionless, typically 2 to 2.6)"));
  if (bad) return bad;
  return finiteResult("mass", mass / (cd * dragArea));
}
