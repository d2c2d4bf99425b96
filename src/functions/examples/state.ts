import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7, invented): its 690 km sun-synchronous orbit at 98.2 deg.
export const STATE_EXAMPLES: Record<string, ExampleArg[]> = {
  STATE_FROM_ELEMENTS: ["Earth", 7068.137, 0.001, 98.2, 40, 90, 30, true],
  ELEMENTS_FROM_STATE: ["Earth", [[7068.137, 0, 0, 0, -1.0727, 7.4333]], true],
  PROPAGATE_STATE: ["Earth", [[7068.137, 0, 0, 0, -1.0727, 7.4333]], 3000],
};
