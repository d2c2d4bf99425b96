/** One published constant with where it came from (DESIGN.md §2: a body's constants live here only). */
export interface Sourced {
  value: number;
  /** Key into SOURCES (src/catalogue/sources.ts). */
  source: string;
  /** True where the value was recalled, not read from a stored copy of the source. */
  fromMemory?: boolean;
}

export type BodyKind = "star" | "planet" | "dwarf planet" | "moon" | "asteroid";

export interface Body {
  /** Display name, e.g. "Earth". Lookup is case-insensitive on name and aliases. */
  name: string;
  aliases?: string[];
  kind: BodyKind;
  /** Name of the body it orbits, null for the Sun. */
  parent: string | null;
  /** GM of the body alone, km^3/s^2. */
  gm: Sourced;
  /** GM of the body with its moons (for heliocentric work: SOI, Hill radius), where it differs. */
  systemGm?: Sourced;
  /** km */
  equatorialRadius: Sourced;
  /** km */
  meanRadius: Sourced;
  /** Unnormalised zonal harmonic J2, with the reference radius it goes with (km). */
  j2?: Sourced;
  j2ReferenceRadius?: Sourced;
  /** Sidereal rotation period, s; negative for retrograde rotation. */
  rotationPeriod?: Sourced;
  /** Orbit about the parent: sma km, ecc, inc deg (to the parent's reference plane, see source), period s. */
  orbit?: {
    sma: Sourced;
    ecc: Sourced;
    inc: Sourced;
    period: Sourced;
  };
}
