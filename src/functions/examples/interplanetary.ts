import type { ExampleArg } from "../examples";

// The Skerry-L Mars flyby variant (DESIGN.md §7, invented): an Earth-to-Mars window in late 2028.
// 47082 is 2028-11-25 and 47292 is 2029-06-23 as Excel date serials.
export const INTERPLANETARY_EXAMPLES: Record<string, ExampleArg[]> = {
  LAMBERT_SOLVE: ["Earth", [[7000, 0, 0]], [[0, 12000, 1000]], 3600],
  PLANET_STATE: ["Mars", 47082],
  TRANSFER_BETWEEN: ["Earth", "Mars", 47082, 47292, true],
  TRANSFER_GRID: ["Earth", "Mars", 47030, 10, 6, 150, 30, 5, "c3", true],
};
