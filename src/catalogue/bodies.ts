import type { Body } from "./types";

// Placeholder rows (the full catalogue replaces this file).
export const BODIES: readonly Body[] = [
  {
    name: "Sun", kind: "star", parent: null,
    gm: { value: 1.3271244004127942e11, source: "DE440" },
    equatorialRadius: { value: 695700, source: "IAU2015B3" },
    meanRadius: { value: 695700, source: "IAU2015B3" },
  },
  {
    name: "Earth", kind: "planet", parent: "Sun",
    gm: { value: 3.9860043550702266e5, source: "DE440" },
    equatorialRadius: { value: 6378.137, source: "DE440" },
    meanRadius: { value: 6371.0084, source: "DE440" },
  },
];
