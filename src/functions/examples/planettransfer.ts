import type { ExampleArg } from "../examples";

// Skerry-L's Mars flyby variant (DESIGN.md §7): the first look at an Earth-to-Mars window.
export const PLANET_TRANSFER_EXAMPLES: Record<string, ExampleArg[]> = {
  PLANET_TRANSFER: ["Earth", "Mars", true],
};
