import { WGS84_A, WGS84_F, WGS84_GM, WGS84_J2, WGS84_OMEGA } from "../core/wgs84";
import { printedDigits } from "./digits";
import type { Body, Sourced } from "./types";

/*
 * The body catalogue: every number carries the key of its source (sources.ts). Conventions:
 *  - GM of the body alone in `gm`; `systemGm` (body with its moons) only where DE440 gives a
 *    different barycentre value. Earth's systemGm is the Earth-Moon barycentre GM (DE440 BODY3):
 *    the Sun pulls on, and heliocentric orbits are those of, the Earth-Moon pair, so SOI, Hill
 *    radius and planet-to-planet transfers use it; orbits about Earth use `gm`.
 *  - Radii in km. For a triaxial moon or asteroid the equatorial radius is the longest semi-axis
 *    a of the published ellipsoid (toward the parent for a locked moon) and the polar radius c.
 *  - Rotation periods in s, negative for retrograde spin. Where a source gives only the
 *    prime-meridian rate W-dot, the period is 360 deg / W-dot (marked `computed`).
 *  - Orbits: planets from Standish Table 1 at J2000 (a, e, I) with the JPL SSD sidereal period;
 *    moons from the JPL satellite mean elements, period 360 deg / n from the table's mean motion.
 *    Inclinations are to the source's reference plane (ecliptic or Laplace plane; see `frame`)
 *    and read 0 to 180 deg (above 90: retrograde).
 *  - A value stored in another unit than the source prints it, or computed from printed
 *    numbers, keeps the source's significant digits in `digits` (tables show those digits).
 * Accuracy: the digits of the sources. These are mean or nominal values for preliminary
 * two-body work, not ephemerides.
 */

const DAY = 86400; // s
const JULIAN_YEAR = 365.25 * DAY; // s
const AU = 149597870.7; // km, IAU 2012 Resolution B2 (exact)
const CENTURY = 36525 * DAY; // s, Julian century

type Orbit = NonNullable<Body["orbit"]>;

const v = (value: number, source: string, extra: Partial<Sourced> = {}): Sourced => ({ value, source, ...extra });
const memory = (value: number, source: string, note?: string): Sourced =>
  note ? { value, source, fromMemory: true, note } : { value, source, fromMemory: true };

/** A value the source prints in another unit: `printed` times an exact factor, with the printed digits. */
const scaled = (printed: number, factor: number, source: string, extra: Partial<Sourced> = {}): Sourced =>
  v(printed * factor, source, { digits: printedDigits(printed), ...extra });
const days = (d: number, source: string, extra: Partial<Sourced> = {}): Sourced => scaled(d, DAY, source, extra);
const hours = (h: number, source: string, extra: Partial<Sourced> = {}): Sourced => scaled(h, 3600, source, extra);
const julianYears = (y: number, source: string): Sourced => scaled(y, JULIAN_YEAR, source);

/** Sidereal period from a prime-meridian rate in deg/day (negative rate: retrograde). */
const spinFromRate = (wDot: number, source: string): Sourced =>
  v((360 / wDot) * DAY, source, { computed: `P = 360 deg / W-dot, W-dot = ${wDot} deg/day`, digits: printedDigits(wDot) });

/** Orbital period from a tabulated mean motion n in deg/day. */
const periodFromMeanMotion = (n: number, source: string): Sourced =>
  v((360 / n) * DAY, source, { computed: `P = 360 deg / n, n = ${n} deg/day`, digits: printedDigits(n) });

/** Sidereal period from Standish's mean-longitude rate L-dot in deg per Julian century. */
const periodFromLongitudeRate = (lDot: number): Sourced =>
  v((360 / lDot) * CENTURY, "STANDISH", { computed: `P = 360 deg / L-dot, L-dot = ${lDot} deg/Julian century`, digits: printedDigits(lDot) });

const STANDISH_FRAME = "heliocentric, mean ecliptic and equinox of J2000, at J2000 (Standish Table 1)";

/** A planet's J2000 orbit from Standish Table 1 (a in au) with a period in s. */
const standishOrbit = (aAu: number, e: number, incDeg: number, period: Sourced): Orbit => ({
  sma: scaled(aAu, AU, "STANDISH", { note: `a = ${aAu} au` }),
  ecc: v(e, "STANDISH"),
  inc: v(incDeg, "STANDISH", { note: "to the J2000 ecliptic" }),
  period,
  frame: STANDISH_FRAME,
});

/** A moon's orbit from the JPL satellite mean-elements table. */
const satOrbit = (aKm: number, e: number, incDeg: number, nDegPerDay: number, frame: string): Orbit => ({
  sma: v(aKm, "JPL_SAT_ELEM"),
  ecc: v(e, "JPL_SAT_ELEM"),
  inc: v(incDeg, "JPL_SAT_ELEM", { note: frame }),
  period: periodFromMeanMotion(nDegPerDay, "JPL_SAT_ELEM"),
  frame,
});

const LAPLACE = "planetocentric, to the satellite's local Laplace plane (JPL mean elements)";

const URANUS_EQUATOR =
  "Uranus-centric, to Uranus's equator with the pole along the orbits' angular momentum (the IAU south pole of Uranus), epoch 2000 Jan 1.5 TDB (URA182 mean elements)";

/** A Uranian moon's orbit from the JPL mean elements of the URA182 solution (period printed in days). */
const uranianOrbit = (aKm: number, e: number, incDeg: number, periodDays: number): Orbit => ({
  sma: v(aKm, "JPL_SAT_ELEM_URA182"),
  ecc: v(e, "JPL_SAT_ELEM_URA182"),
  inc: v(incDeg, "JPL_SAT_ELEM_URA182", { note: "to Uranus's equator (pole along the orbital angular momentum)" }),
  period: days(periodDays, "JPL_SAT_ELEM_URA182"),
  frame: URANUS_EQUATOR,
});

/** Radius of the sphere of the same volume as a triaxial ellipsoid, to the digits of its axes. */
const equalVolumeRadius = (a: number, b: number, c: number, source: string): Sourced => {
  const digits = Math.min(printedDigits(a), printedDigits(b), printedDigits(c));
  return v(Number(Math.cbrt(a * b * c).toPrecision(digits)), source, { computed: `(a b c)^(1/3) of the ${a} x ${b} x ${c} km ellipsoid`, digits });
};

export const BODIES: readonly Body[] = [
  {
    name: "Sun",
    kind: "star",
    parent: null,
    gm: v(1.3271244004127942e11, "DE440"),
    // IAU 2015 B3 nominal solar radius 6.957e8 m, adopted by WGCCRE 2015 for the Sun.
    equatorialRadius: v(695700, "IAU2015B3"),
    meanRadius: v(695700, "IAU2015B3"),
    // DE430's solar J2 and the radius it is referred to; DE440's value was not found in a stored text.
    j2: v(2.110608853272684e-7, "FOLKNER2014"),
    j2ReferenceRadius: v(696000, "FOLKNER2014"),
    // Carrington rate; the Sun's surface rotates differentially (faster at the equator).
    rotationPeriod: spinFromRate(14.1844, "WGCCRE2009"),
  },
  {
    name: "Mercury",
    kind: "planet",
    parent: "Sun",
    // No moons: DE440 gives BODY1 (barycentre) = BODY199, so no separate system GM.
    gm: v(2.2031868551400003e4, "DE440"),
    equatorialRadius: v(2440.53, "JPL_SSD_PLANETS"),
    meanRadius: v(2439.4, "JPL_SSD_PLANETS"),
    j2: v(5.03e-5, "SMITH2012"),
    j2ReferenceRadius: v(2440, "SMITH2012"),
    rotationPeriod: days(58.6462, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(0.38709927, 0.20563593, 7.00497902, julianYears(0.2408467, "JPL_SSD_PLANETS")),
  },
  {
    name: "Venus",
    kind: "planet",
    parent: "Sun",
    gm: v(3.24858592e5, "DE440"),
    equatorialRadius: v(6051.8, "JPL_SSD_PLANETS"),
    meanRadius: v(6051.8, "JPL_SSD_PLANETS"),
    polarRadius: v(6051.8, "WGCCRE2015"),
    // NSSDC's Venus fact sheet value; the sheet states no reference radius, so none is given.
    j2: v(4.458e-6, "NSSDC", { note: "the fact sheet states no reference radius for it" }),
    rotationPeriod: days(-243.018, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(0.72333566, 0.00677672, 3.39467605, julianYears(0.61519726, "JPL_SSD_PLANETS")),
  },
  {
    name: "Earth",
    kind: "planet",
    parent: "Sun",
    gm: v(3.9860043550702266e5, "DE440"),
    // Earth-Moon barycentre (DE440 BODY3), for heliocentric work; see the note at the top.
    systemGm: v(4.0350323562548019e5, "DE440", { note: "Earth-Moon barycentre GM" }),
    equatorialRadius: v(6378.1366, "JPL_SSD_PLANETS"),
    meanRadius: v(6371.0084, "JPL_SSD_PLANETS"),
    polarRadius: v(6356.7519, "WGCCRE2015"),
    // One model for J2 and its radius: EGM2008 tide-free (not WGS 84, EGM96 or IERS zero-tide,
    // which differ in the 6th significant digit). The model's own GM is 398600.4415 km^3/s^2,
    // 1.5e-8 relative from DE440's, far below what J2 drift rates resolve.
    j2: v(1.0826261738522227e-3, "EGM2008", {
      computed: "J2 = -sqrt(5) * C20bar, C20bar = -0.484165143790815e-3 (EGM2008 tide-free)",
      digits: printedDigits(0.484165143790815e-3),
    }),
    j2ReferenceRadius: v(6378.1363, "EGM2008"),
    rotationPeriod: days(0.99726968, "JPL_SSD_PLANETS", { note: "sidereal day" }),
    // The ground functions' ellipsoid. Its numbers live in src/core/wgs84.ts (the core's one home
    // of them); the catalogue shows those constants with their source rather than a copy.
    ellipsoid: {
      name: "WGS 84",
      semiMajorAxis: v(WGS84_A, "WGS84", { note: "a = 6378137.0 m, a defining parameter of WGS 84" }),
      inverseFlattening: v(1 / WGS84_F, "WGS84", { note: "1/f, a defining parameter of WGS 84" }),
      gm: v(WGS84_GM, "WGS84", { note: "GM including the atmosphere, a defining parameter of WGS 84" }),
      rotationRate: v(WGS84_OMEGA, "WGS84", { note: "nominal mean angular velocity, 7292115.0e-11 rad/s, a defining parameter of WGS 84" }),
      j2: v(WGS84_J2, "WGS84", { computed: "J2 = -sqrt(5) * C20bar, C20bar = -0.484166774985e-3 (WGS 84)", digits: printedDigits(0.484166774985e-3) }),
    },
    // Standish's entry is the Earth-Moon barycentre; its orbit is the one heliocentric work needs.
    // Standish prints I = -0.00001531 deg with the node at 0 deg: the same plane as I = +0.00001531
    // deg with the node at 180 deg. The catalogue gives the non-negative form, as for every other
    // inclination, and the table's notes say so.
    orbit: {
      ...standishOrbit(1.00000261, 0.01671123, 0.00001531, julianYears(1.0000174, "JPL_SSD_PLANETS")),
      inc: v(0.00001531, "STANDISH", {
        computed: "Standish Table 1 prints I = -0.00001531 deg with the node at 0 deg; the same plane is I = +0.00001531 deg with the node at 180 deg",
        note: "to the J2000 ecliptic, given as 0 to 180 deg like every inclination here",
      }),
      frame: `${STANDISH_FRAME}; elements of the Earth-Moon barycentre`,
    },
  },
  {
    name: "Moon",
    aliases: ["Luna"],
    kind: "moon",
    parent: "Earth",
    gm: v(4.9028001184575496e3, "DE440"),
    equatorialRadius: v(1737.4, "WGCCRE2015"),
    meanRadius: v(1737.4, "JPL_SSD_SATELLITES"),
    polarRadius: v(1737.4, "WGCCRE2015"),
    // NSSDC's degree-2 value; its reference radius is not stated there, so none is given here.
    j2: v(202.7e-6, "NSSDC"),
    rotationPeriod: hours(655.728, "NSSDC", { note: "older NSSDC edition; the current sheet reads 655.720 h" }),
    orbit: {
      sma: v(384400, "JPL_SAT_ELEM"),
      ecc: v(0.0554, "JPL_SAT_ELEM"),
      inc: v(5.16, "JPL_SAT_ELEM", { note: "to the ecliptic" }),
      period: periodFromMeanMotion(13.176358, "JPL_SAT_ELEM"),
      frame: "geocentric mean ecliptic elements, epoch 2000 Jan 1.5 TT (DE405/LE405)",
    },
  },
  {
    name: "Mars",
    kind: "planet",
    parent: "Sun",
    gm: v(4.282837362069909e4, "DE440"),
    systemGm: v(4.2828375815756102e4, "DE440"),
    equatorialRadius: v(3396.19, "JPL_SSD_PLANETS"),
    meanRadius: v(3389.5, "JPL_SSD_PLANETS"),
    polarRadius: v(3376.2, "WGCCRE2015"),
    // NSSDC's J2 is the MRO110B2 value (Konopliv et al. 2011), whose reference radius is 3396 km.
    j2: v(1960.45e-6, "NSSDC"),
    j2ReferenceRadius: v(3396, "KONOPLIV2011"),
    rotationPeriod: days(1.02595676, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(1.52371034, 0.0933941, 1.84969142, julianYears(1.8808476, "JPL_SSD_PLANETS")),
  },
  {
    name: "Phobos",
    kind: "moon",
    parent: "Mars",
    gm: v(7.087546066894452e-4, "DE440"),
    equatorialRadius: v(13.0, "WGCCRE2015"),
    meanRadius: v(11.08, "JPL_SSD_SATELLITES"),
    polarRadius: v(9.1, "WGCCRE2015"),
    rotationPeriod: spinFromRate(1128.84475928, "WGCCRE2015"),
    orbit: satOrbit(9376, 0.0151, 1.075, 1128.8447569, `${LAPLACE}, epoch 1950 Jan 1.0 TT (MAR080)`),
  },
  {
    name: "Deimos",
    kind: "moon",
    parent: "Mars",
    gm: v(9.615569648120313e-5, "DE440"),
    equatorialRadius: v(7.8, "WGCCRE2015"),
    meanRadius: v(6.2, "JPL_SSD_SATELLITES"),
    polarRadius: v(5.1, "WGCCRE2015"),
    rotationPeriod: spinFromRate(285.16188899, "WGCCRE2015"),
    orbit: satOrbit(23458, 0.0002, 1.788, 285.161879, `${LAPLACE}, epoch 1950 Jan 1.0 TT (MAR080)`),
  },
  {
    name: "Jupiter",
    kind: "planet",
    parent: "Sun",
    gm: v(1.266865319003704e8, "DE440"),
    systemGm: v(1.2671276409999998e8, "DE440"),
    // 71492 and 66854 km are also the IAU 2015 B3 nominal jovian radii (exact).
    equatorialRadius: v(71492, "JPL_SSD_PLANETS"),
    meanRadius: v(69911, "JPL_SSD_PLANETS"),
    polarRadius: v(66854, "IAU2015B3"),
    // Juno value with its reference radius; NSSDC's older 14736e-6 has none stated.
    j2: v(14696.5063e-6, "IESS2018"),
    j2ReferenceRadius: v(71492, "IESS2018"),
    rotationPeriod: days(0.41354, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(5.202887, 0.04838624, 1.30439695, julianYears(11.862615, "JPL_SSD_PLANETS")),
  },
  {
    name: "Io",
    kind: "moon",
    parent: "Jupiter",
    gm: v(5.959915466180539e3, "GM_DE440_SATELLITES"),
    equatorialRadius: v(1829.4, "WGCCRE2015"),
    meanRadius: v(1821.49, "JPL_SSD_SATELLITES"),
    polarRadius: v(1815.7, "WGCCRE2015"),
    rotationPeriod: spinFromRate(203.4889538, "WGCCRE2015"),
    orbit: satOrbit(421800, 0.0041, 0.036, 203.4889583, `${LAPLACE}, epoch 1997 Jan 16.0 TT`),
  },
  {
    name: "Europa",
    kind: "moon",
    parent: "Jupiter",
    gm: v(3.202712099607295e3, "GM_DE440_SATELLITES"),
    equatorialRadius: v(1562.6, "WGCCRE2015"),
    meanRadius: v(1560.8, "JPL_SSD_SATELLITES"),
    polarRadius: v(1559.5, "WGCCRE2015"),
    rotationPeriod: spinFromRate(101.3747235, "WGCCRE2015"),
    orbit: satOrbit(671100, 0.0094, 0.466, 101.3747242, `${LAPLACE}, epoch 1997 Jan 16.0 TT`),
  },
  {
    name: "Ganymede",
    kind: "moon",
    parent: "Jupiter",
    gm: v(9.887832752719638e3, "GM_DE440_SATELLITES"),
    equatorialRadius: v(2631.2, "WGCCRE2015"),
    meanRadius: v(2631.2, "JPL_SSD_SATELLITES"),
    polarRadius: v(2631.2, "WGCCRE2015"),
    rotationPeriod: spinFromRate(50.3176081, "WGCCRE2015"),
    orbit: satOrbit(1070400, 0.0013, 0.177, 50.3176072, `${LAPLACE}, epoch 1997 Jan 16.0 TT`),
  },
  {
    name: "Callisto",
    kind: "moon",
    parent: "Jupiter",
    gm: v(7.179283402579837e3, "GM_DE440_SATELLITES"),
    equatorialRadius: v(2410.3, "WGCCRE2015"),
    meanRadius: v(2410.3, "JPL_SSD_SATELLITES"),
    polarRadius: v(2410.3, "WGCCRE2015"),
    rotationPeriod: spinFromRate(21.5710715, "WGCCRE2015"),
    orbit: satOrbit(1882700, 0.0074, 0.192, 21.5710728, `${LAPLACE}, epoch 1997 Jan 16.0 TT`),
  },
  {
    name: "Saturn",
    kind: "planet",
    parent: "Sun",
    gm: v(3.793120623436167e7, "DE440"),
    systemGm: v(3.7940584841799997e7, "DE440"),
    equatorialRadius: v(60268, "JPL_SSD_PLANETS"),
    meanRadius: v(58232, "JPL_SSD_PLANETS"),
    polarRadius: v(54364, "WGCCRE2015"),
    j2: v(16290.573e-6, "IESS2019"),
    j2ReferenceRadius: v(60330, "IESS2019"),
    rotationPeriod: days(0.44401, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(9.53667594, 0.05386179, 2.48599187, julianYears(29.447498, "JPL_SSD_PLANETS")),
  },
  {
    name: "Enceladus",
    kind: "moon",
    parent: "Saturn",
    gm: v(7.210366688598896, "GM_DE440_SATELLITES"),
    equatorialRadius: v(256.6, "WGCCRE2015"),
    meanRadius: v(252.1, "JPL_SSD_SATELLITES"),
    polarRadius: v(248.3, "WGCCRE2015"),
    rotationPeriod: spinFromRate(262.7318996, "WGCCRE2015"),
    // The table's mean eccentricity is 0.0000 as printed: the eccentricity the Dione resonance
    // forces is periodic, and mean elements leave it out.
    orbit: satOrbit(238042, 0.0, 0.003, 262.7318978, LAPLACE),
  },
  {
    name: "Titan",
    kind: "moon",
    parent: "Saturn",
    gm: v(8.978137095521046e3, "GM_DE440_SATELLITES"),
    equatorialRadius: v(2575.15, "WGCCRE2015"),
    meanRadius: v(2574.76, "JPL_SSD_SATELLITES"),
    polarRadius: v(2574.47, "WGCCRE2015"),
    rotationPeriod: spinFromRate(22.5769768, "WGCCRE2015"),
    orbit: satOrbit(1221865, 0.0288, 0.306, 22.5769756, LAPLACE),
  },
  {
    name: "Uranus",
    kind: "planet",
    parent: "Sun",
    gm: v(5.793951256527211e6, "DE440"),
    systemGm: v(5.7945563999999985e6, "DE440"),
    equatorialRadius: v(25559, "JPL_SSD_PLANETS"),
    meanRadius: v(25362, "JPL_SSD_PLANETS"),
    polarRadius: v(24973, "WGCCRE2015"),
    j2: v(3510.7e-6, "JACOBSON2014"),
    j2ReferenceRadius: v(25559, "JACOBSON2014"),
    rotationPeriod: days(-0.71833, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(19.18916464, 0.04725744, 0.77263783, julianYears(84.016846, "JPL_SSD_PLANETS")),
  },
  // The five major moons of Uranus. GM: gm_de440.tpc (from URA111, Jacobson 2014); radii and
  // spin: WGCCRE 2015 (pck00011); orbits: JPL mean elements of URA182. Their negative W-dot
  // (retrograde spin about the IAU north pole, like Uranus's own) gives negative periods.
  {
    name: "Miranda",
    kind: "moon",
    parent: "Uranus",
    gm: v(4.3195168992321, "GM_DE440_SATELLITES"),
    equatorialRadius: v(240.4, "WGCCRE2015"),
    meanRadius: equalVolumeRadius(240.4, 234.2, 232.9, "WGCCRE2015"),
    polarRadius: v(232.9, "WGCCRE2015"),
    rotationPeriod: spinFromRate(-254.6906892, "WGCCRE2015"),
    orbit: uranianOrbit(129846, 0.001, 4.4, 1.413479),
  },
  {
    name: "Ariel",
    kind: "moon",
    parent: "Uranus",
    gm: v(83.46344431770477, "GM_DE440_SATELLITES"),
    equatorialRadius: v(581.1, "WGCCRE2015"),
    meanRadius: equalVolumeRadius(581.1, 577.9, 577.7, "WGCCRE2015"),
    polarRadius: v(577.7, "WGCCRE2015"),
    rotationPeriod: spinFromRate(-142.8356681, "WGCCRE2015"),
    orbit: uranianOrbit(190929, 0.001, 0.0, 2.520379),
  },
  {
    name: "Umbriel",
    kind: "moon",
    parent: "Uranus",
    gm: v(85.09338094489388, "GM_DE440_SATELLITES"),
    equatorialRadius: v(584.7, "WGCCRE2015"),
    meanRadius: v(584.7, "WGCCRE2015"),
    polarRadius: v(584.7, "WGCCRE2015"),
    rotationPeriod: spinFromRate(-86.8688923, "WGCCRE2015"),
    orbit: uranianOrbit(265986, 0.004, 0.1, 4.144177),
  },
  {
    name: "Titania",
    kind: "moon",
    parent: "Uranus",
    gm: v(226.9437003741248, "GM_DE440_SATELLITES"),
    equatorialRadius: v(788.9, "WGCCRE2015"),
    meanRadius: v(788.9, "WGCCRE2015"),
    polarRadius: v(788.9, "WGCCRE2015"),
    rotationPeriod: spinFromRate(-41.3514316, "WGCCRE2015"),
    orbit: uranianOrbit(436298, 0.002, 0.1, 8.705869),
  },
  {
    name: "Oberon",
    kind: "moon",
    parent: "Uranus",
    gm: v(205.3234302535623, "GM_DE440_SATELLITES"),
    equatorialRadius: v(761.4, "WGCCRE2015"),
    meanRadius: v(761.4, "WGCCRE2015"),
    polarRadius: v(761.4, "WGCCRE2015"),
    rotationPeriod: spinFromRate(-26.7394932, "WGCCRE2015"),
    orbit: uranianOrbit(583511, 0.002, 0.1, 13.463237),
  },
  {
    name: "Neptune",
    kind: "planet",
    parent: "Sun",
    gm: v(6.835103145462294e6, "DE440"),
    systemGm: v(6.8365271005803989e6, "DE440"),
    equatorialRadius: v(24764, "JPL_SSD_PLANETS"),
    meanRadius: v(24622, "JPL_SSD_PLANETS"),
    polarRadius: v(24341, "WGCCRE2015"),
    j2: v(3408.4e-6, "JACOBSON2009"),
    j2ReferenceRadius: v(25225, "JACOBSON2009"),
    rotationPeriod: days(0.67125, "JPL_SSD_PLANETS"),
    orbit: standishOrbit(30.06992276, 0.00859048, 1.77004347, julianYears(164.79132, "JPL_SSD_PLANETS")),
  },
  {
    name: "Triton",
    kind: "moon",
    parent: "Neptune",
    gm: v(1.428495462910464e3, "GM_DE440_SATELLITES"),
    equatorialRadius: v(1352.6, "WGCCRE2015"),
    meanRadius: v(1352.6, "JPL_SSD_SATELLITES"),
    polarRadius: v(1352.6, "WGCCRE2015"),
    // Negative W-dot: Triton spins (and orbits) retrograde.
    rotationPeriod: spinFromRate(-61.2572637, "WGCCRE2015"),
    orbit: satOrbit(354759, 0.0, 156.865, 61.2572638, LAPLACE),
  },
  {
    name: "Pluto",
    aliases: ["134340 Pluto"],
    kind: "dwarf planet",
    parent: "Sun",
    gm: v(8.696138177608748e2, "DE440"),
    systemGm: v(9.755e2, "DE440"),
    equatorialRadius: v(1188.3, "WGCCRE2015"),
    meanRadius: v(1188.3, "JPL_SSD_PLANETS"),
    polarRadius: v(1188.3, "WGCCRE2015"),
    // The magnitude 6.3872 d is confirmed in a stored table; the retrograde sign is JPL SSD's
    // (recalled), relative to Pluto's orbit.
    rotationPeriod: { ...memory(-6.3872 * DAY, "JPL_SSD_PLANETS", "magnitude confirmed, retrograde sign from memory"), digits: printedDigits(6.3872) },
    // Pluto is not in the JPL SSD planet table; its period is 360 deg over Standish's L-dot.
    orbit: standishOrbit(39.48211675, 0.2488273, 17.14001206, periodFromLongitudeRate(145.20780515)),
  },
  {
    name: "Charon",
    kind: "moon",
    parent: "Pluto",
    gm: v(1.058799888601881e2, "GM_DE440_SATELLITES"),
    equatorialRadius: v(606, "WGCCRE2015"),
    meanRadius: v(606, "JPL_SSD_SATELLITES"),
    polarRadius: v(606, "WGCCRE2015"),
    rotationPeriod: spinFromRate(56.3625225, "WGCCRE2015"),
    // Charon's mean elements were not found in any stored text: all four recalled from the JPL table.
    orbit: {
      sma: memory(19591.4, "JPL_SAT_ELEM"),
      ecc: memory(0.0002, "JPL_SAT_ELEM"),
      inc: memory(0.08, "JPL_SAT_ELEM", "to the local Laplace plane (about Pluto's equator)"),
      period: { ...memory(6.38723 * DAY, "JPL_SAT_ELEM"), digits: printedDigits(6.38723) },
      frame: "Pluto-centric, local Laplace plane (recalled, not confirmed in a stored text)",
    },
  },
  {
    name: "Ceres",
    aliases: ["1 Ceres"],
    kind: "dwarf planet",
    parent: "Sun",
    gm: v(6.2628888644409933e1, "DE440_ASTEROIDS"),
    equatorialRadius: v(964.4 / 2, "PARK2016", { computed: "half the longest published extent, 964.4 km" }),
    meanRadius: v(939.4 / 2, "PARK2016", { computed: "half the published effective diameter, 939.4 km" }),
    polarRadius: v(891.8 / 2, "PARK2016", { computed: "half the shortest published extent, 891.8 km" }),
    rotationPeriod: spinFromRate(952.1532, "PARK2016"),
    orbit: {
      sma: scaled(2.765552595034094, AU, "SBDB", { note: "a = 2.765552595034094 au" }),
      ecc: v(0.07969229514816586, "SBDB"),
      inc: v(10.58802780183462, "SBDB", { note: "to the J2000 ecliptic" }),
      period: days(1679.853119758983, "SBDB"),
      frame: "heliocentric ecliptic J2000, osculating at JD 2461200.5 TDB (SBDB orbit 48)",
    },
  },
  {
    name: "Vesta",
    aliases: ["4 Vesta"],
    kind: "asteroid",
    parent: "Sun",
    gm: v(1.7288232879171513e1, "DE440_ASTEROIDS"),
    equatorialRadius: v(569.24 / 2, "PARK2025", { computed: "half the longest published extent, 569.24 km" }),
    meanRadius: v(522.77 / 2, "PARK2025", { computed: "half the published effective diameter, 522.77 km" }),
    polarRadius: v(452.66 / 2, "PARK2025", { computed: "half the shortest published extent, 452.66 km" }),
    rotationPeriod: hours(5.3421276322, "PARK2025"),
    orbit: {
      sma: scaled(2.361365965127599, AU, "SBDB", { note: "a = 2.361365965127599 au" }),
      ecc: v(0.09020374382834395, "SBDB"),
      inc: v(7.143925545058711, "SBDB", { note: "to the J2000 ecliptic" }),
      period: days(1325.389042911101, "SBDB"),
      frame: "heliocentric ecliptic J2000, osculating at JD 2461200.5 TDB (SBDB orbit 36)",
    },
  },
];
