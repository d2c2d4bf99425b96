import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7, invented): a 250 km x 690 km disposal ellipse about Earth.
export const KEPLER_EXAMPLES: Record<string, ExampleArg[]> = {
  SOLVE_ECCENTRIC_ANOMALY: [120, 0.0321],
  SOLVE_HYPERBOLIC_ANOMALY: [2.5, 1.4],
  TRUE_ANOMALY_FROM_MEAN: [120, 0.0321],
  MEAN_ANOMALY_FROM_TRUE: [90, 0.0321],
  TIME_OF_FLIGHT: ["Earth", 6848.137, 0.0321, 0, 180],
  TRUE_ANOMALY_AT_TIME: ["Earth", 6848.137, 0.0321, 0, 1200],
};
