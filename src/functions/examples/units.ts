import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7, invented): its 690 km orbit altitude in metres.
export const UNITS_EXAMPLES: Record<string, ExampleArg[]> = {
  CONVERT_UNIT: [690, "km", "m"],
};
