/** One published constant with where it came from (DEVELOPERS.md, "Layer rules": a body's constants live here only). */
export interface Sourced {
  value: number;
  /** Key into SOURCES (src/catalogue/sources.ts). */
  source: string;
  /** True where the value was recalled, not read from a stored copy of the source. */
  fromMemory?: boolean;
  /**
   * Set where the value is not printed in the source but computed from numbers it prints, by a
   * published formula; says which (e.g. "P = 360 deg / n, n = 203.4889583 deg/day"). Plain unit
   * conversions by exact factors (day = 86400 s, au = 149 597 870.7 km) are not marked.
   */
  computed?: string;
  /** What the value refers to where that is not obvious (reference plane, epoch, model). */
  note?: string;
  /**
   * Significant digits the source gives, where `value` does not show them itself: a value
   * converted from the source's unit (0.99726968 d stored in s), or computed from printed
   * numbers (the digits of the least precise input). Unset: the digits of `value` as printed
   * (see digits.ts).
   */
  digits?: number;
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
  /** Polar radius (the semi-axis along the spin axis), km, where a published shape gives one. */
  polarRadius?: Sourced;
  /** Unnormalised zonal harmonic J2, with the reference radius it goes with (km). */
  j2?: Sourced;
  j2ReferenceRadius?: Sourced;
  /** Sidereal rotation period, s; negative for retrograde rotation. */
  rotationPeriod?: Sourced;
  /**
   * The reference ellipsoid the ground-geometry functions use for the body (Earth: WGS 84), by its
   * defining parameters and the J2 of its gravity model.
   */
  ellipsoid?: {
    name: string;
    /** km */
    semiMajorAxis: Sourced;
    /** 1/f, dimensionless. */
    inverseFlattening: Sourced;
    /** GM of the ellipsoid's model (for WGS 84 with the atmosphere), km^3/s^2. */
    gm: Sourced;
    /** Angular velocity of the body's rotation, rad/s. */
    rotationRate: Sourced;
    /** Unnormalised J2 of the ellipsoid's gravity model. */
    j2: Sourced;
  };
  /** Orbit about the parent: sma km, ecc, inc deg (to the parent's reference plane, see source), period s. */
  orbit?: {
    sma: Sourced;
    ecc: Sourced;
    inc: Sourced;
    period: Sourced;
    /** Reference plane and epoch of these elements, in words. */
    frame?: string;
  };
}
