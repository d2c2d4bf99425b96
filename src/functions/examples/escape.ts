import type { ExampleArg } from "../examples";

// Skerry-L and its Mars flyby variant (DESIGN.md §7): Earth departure from 300 km, capture into a
// 100 km lunar orbit, a 500 km Mars flyby.
export const ESCAPE_EXAMPLES: Record<string, ExampleArg[]> = {
  HYPERBOLIC_EXCESS_SPEED: ["Earth", 6678.137, 11.5],
  C3_ENERGY: [3.2],
  DEPARTURE_DV: ["Earth", 6678.137, 3.2],
  CAPTURE_DV: ["Moon", 1837.4, 0.8],
  FLYBY_TURN_ANGLE: ["Mars", 3896.2, 3],
  SOI_RADIUS: ["Moon"],
  HILL_RADIUS: ["Earth"],
  SYNODIC_PERIOD: ["Earth", "Mars"],
};
