import type { ExampleArg } from "../examples";

export const BODIES_EXAMPLES: Record<string, ExampleArg[]> = {
  BODY_GM: ["Earth"],
  BODY_RADIUS: ["Mars"],
  BODY_VALUE: ["Jupiter", "j2"],
  BODY_TABLE: ["gm, mean_radius", "Earth, Moon, Mars", true],
};
