import type { ExampleArg } from "../examples";

// Skerry-1 (DESIGN.md §7): 180 kg at separation, monopropellant thruster of Isp 225 s.
export const PROPELLANT_EXAMPLES: Record<string, ExampleArg[]> = {
  ROCKET_DV: [225, 180, 172.5],
  PROPELLANT_MASS: [0.1, 225, 172.5],
  MASS_RATIO: [0.1, 225],
  BURN_SEQUENCE: [[[0.0458], [0.0459], [0.105], [0.121]], 225, 180, 150, true],
};
