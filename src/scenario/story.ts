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
  /** m/s per year (invented). */
  stationKeepingPerYear: 4,
  /** km, the perigee the disposal burn lowers to. */
  disposalPerigee: 250,
  /** Fraction added to every manoeuvre (invented). */
  margin: 0.1,
  /** kg, with all usable propellant gone (invented). */
  dryMass: 150,
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
