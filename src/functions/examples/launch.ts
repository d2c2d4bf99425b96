import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7, invented): a rideshare from an invented site at 34.7 deg N into 97.4 deg,
// southbound, and passes over an invented ground station at 64.9 deg N.
export const LAUNCH_EXAMPLES: Record<string, ExampleArg[]> = {
  LAUNCH_AZIMUTH: [34.7, 97.4, "Earth", 7.613, true],
  SURFACE_ROTATION_SPEED: ["Earth", 34.7],
  GREAT_CIRCLE_DISTANCE: ["Earth", 34.7, -120.6, 64.9, -147.9],
  GREAT_CIRCLE_COURSE: [34.7, -120.6, 64.9, -147.9],
  RHUMB_LINE_DISTANCE: ["Earth", 34.7, -120.6, 64.9, -147.9],
  RHUMB_LINE_COURSE: [34.7, -120.6, 64.9, -147.9],
  HORIZON_RANGE: ["Earth", 690, 10],
};
