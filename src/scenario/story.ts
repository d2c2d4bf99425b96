/**
 * The Skerry scenario's own numbers (DEVELOPERS.md, "The Skerry demo scenario"), each typed once:
 * the sheets write them into input cells, and titles and notes quote them from here. All of it
 * is invented for the demo; none of it is a real mission or a reference value.
 */

/** Skerry-1, a 180 kg survey smallsat, and its budget from the rideshare orbit to disposal. */
export const SKERRY_1 = {
  body: "Earth",
  /** kg, at separation from the rideshare. */
  wetMass: 180,
  /** s, monopropellant thruster. */
  isp: 225,
  /** km, circular. */
  rideshareAltitude: 520,
  /** deg. */
  rideshareInclination: 97.4,
  /** km, circular and sun-synchronous. */
  missionAltitude: 690,
  stationKeepingYears: 5,
  /** km, the perigee the disposal burn lowers to. */
  disposalPerigee: 250,
  /** m², the mean area a tumbling Skerry-1 presents to the flow (invented). */
  dragArea: 1.2,
  /** Drag coefficient: 2.2, common practice for a tumbling or flat-plate smallsat (real values about 2 to 2.6). */
  dragCoefficient: 2.2,
  /** End of the station-keeping years, UTC calendar date (invented): the disposal orbit is entered then. */
  endOfMission: [2032, 1, 1] as const,
  /** Fraction added to every manoeuvre (invented). */
  margin: 0.1,
  /** kg, with all usable propellant gone (invented). */
  dryMass: 150,
} as const;

/**
 * Solar activity held over the years ahead, as F10.7 in sfu (10⁻²² W m⁻² Hz⁻¹): solar minimum,
 * moderate activity and solar maximum (common practice). The budget carries the high level, the
 * most drag and so the most make-up delta-v: the conservative figure for a propellant budget.
 */
export const SOLAR_ACTIVITY = { low: 70, moderate: 150, high: 220 } as const;

/**
 * Disposal limits, years from the end of the mission: the 25-year guideline of the debris
 * mitigation standards and the 5-year rule some licensing authorities now apply (the lifetime
 * sheet's note names them).
 */
export const DISPOSAL_LIMITS = { strictYears: 5, guidelineYears: 25 } as const;

/**
 * Skerry-1's element set: an invented two-line element set (catalogue number 99001 and
 * designator 26999A are made up; checksums valid) for about 690 km, sun-synchronous (98.19°),
 * epoch 2026-05-30 12:00 UTC. The tests of the ground families read it from here.
 */
export const SKERRY_1_TLE = {
  line1: "1 99001U 26999A   26150.50000000  .00000210  00000-0  21000-4 0  9993",
  line2: "2 99001  98.1900 135.0000 0001200  90.0000 270.0000 14.60983543  1057",
} as const;

/**
 * Skerry Ground, the mission's invented ground station (invented coordinates): geodetic latitude
 * (deg, north positive), longitude (deg, east positive) and height above the WGS 84 ellipsoid
 * (km). The tests of the ground families read it from here.
 */
export const SKERRY_GROUND = { name: "Skerry Ground", latitude: 58.21, longitude: -6.39, height: 0.05 } as const;

/** The ground contact sheet: a week of passes of Skerry-1 over Skerry Ground, and its downlink (invented). */
export const CONTACT = {
  /** First day of the week, UTC calendar date. */
  weekStart: [2026, 6, 1] as const,
  /** deg, the elevation a pass must clear to count (assumed for the demo). */
  minElevation: 10,
  /** Hz, an S-band downlink (invented). */
  downlinkFrequency: 2.2e9,
} as const;

/** Skerry-1E, the electric variant of the same bus, and its inspection of an invented companion in the 690 km orbit. */
export const SKERRY_1E = {
  /** N (20 mN). */
  thrust: 0.02,
  /** s. */
  isp: 1500,
  /** km: where the chaser starts, relative to the companion. */
  below: 0.1,
  behind: 2,
  crossTrack: 0.05,
  /** km behind the companion: the hold point. */
  hold: 0.2,
  /** s from burn 1 to burn 2. */
  transferTime: 2400,
  /** deg: the companion's node and argument of latitude at the start. */
  companionRaan: 30,
  companionArgumentOfLatitude: 10,
} as const;

/** Skerry-L, a 24U cubesat study: its baseline reaches a 100 km lunar orbit; its Mars flyby variant looks for the 2028–2029 window. */
export const SKERRY_L = {
  /** kg (invented). */
  wetMass: 36,
  /** s. */
  isp: 215,
  /** km, circular lunar orbit. */
  lunarAltitude: 100,
  /** km, the rideshare's parking orbit before its translunar injection (invented). */
  parkingAltitude: 185,
  /** m/s of trajectory corrections (invented). */
  corrections: 15,
} as const;

/** The Mars flyby variant's window search. */
export const SKERRY_L_MARS = {
  /** First departure, UTC calendar date. */
  firstDeparture: [2028, 7, 1] as const,
  /** days between departures. */
  departureStep: 10,
  departures: 36,
  /** days. */
  firstFlightTime: 120,
  flightTimeStep: 20,
  flightTimes: 16,
  /** km, the parking orbit the departure burn leaves from (invented). */
  parkingAltitude: 300,
} as const;

/** The handout's bodies: a classroom comparison, any catalogue body fits. */
export const HANDOUT = {
  bodies: ["Mercury", "Venus", "Earth", "Moon", "Mars", "Ceres", "Jupiter", "Saturn", "Titan"],
  /** km above each body's equatorial radius. */
  altitude: 200,
  fields: "gm, equatorial_radius, j2, rotation_period",
} as const;

/** The altitude sweep: 300 to 1200 km every 10 km, so the rideshare (520 km) and mission (690 km) altitudes are rows of it. */
export const SWEEP = { first: 300, step: 10, count: 91 } as const;

/** Excel date serial (1900 date system, days since 1899-12-30, UTC) of a calendar date. */
export const excelSerial = (year: number, month: number, day: number): number => (Date.UTC(year, month - 1, day) - Date.UTC(1899, 11, 30)) / 86_400_000;

/** A calendar date as ISO 8601 text, YYYY-MM-DD (for titles). */
export const isoDate = ([year, month, day]: readonly [number, number, number]): string => `${year}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`;
