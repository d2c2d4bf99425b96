import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7, invented): its 690 km sun-synchronous orbit, sma 7068.137 km at 98.15 deg.
export const ENVIRONMENT_EXAMPLES: Record<string, ExampleArg[]> = {
  NODAL_PRECESSION: ["Earth", 7068.137, 0.001, 98.15],
  APSIDAL_PRECESSION: ["Earth", 7068.137, 0.001, 98.15],
  SUN_SYNC_INCLINATION: ["Earth", 7068.137, 0.001],
  REPEAT_TRACK_SMA: ["Earth", 175, 12, 0.001, 98.15],
  ECLIPSE_DURATION: ["Earth", 7068.137, 20],
  BETA_ANGLE: [98.15, 292.5, 46388.5],
};
