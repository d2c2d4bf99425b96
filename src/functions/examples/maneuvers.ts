import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7): 520 km rideshare orbit to 690 km, a 0.8 deg plane trim, phasing at 690 km.
export const MANEUVERS_EXAMPLES: Record<string, ExampleArg[]> = {
  TRANSFER_DV: ["Earth", 6898.137, 7068.137],
  TRANSFER_BURNS: ["Earth", 6898.137, 7068.137, null, true],
  PLANE_CHANGE_DV: [7.5096, 0.8],
  COMBINED_PLANE_CHANGE_DV: [7.4638, 7.5096, 0.8],
  PHASING_ORBIT: ["Earth", 7068.137, 20, 3, true],
};
