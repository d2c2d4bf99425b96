/**
 * Published data for the approximate planet positions of ephemeris.ts:
 * E. M. Standish, "Keplerian Elements for Approximate Positions of the Major Planets", JPL Solar
 * System Dynamics (ssd.jpl.nasa.gov, page "approx_pos"; tables p_elem_t1.txt and p_elem_t2.txt).
 * Elements are referred to the mean ecliptic and equinox of J2000. Each row is
 *   [a (au), e, I (deg), L (deg), varpi = long. of perihelion (deg), Omega = long. of node (deg)]
 * followed by the row of their rates per Julian century (au/Cy, 1/Cy, deg/Cy). "EM Bary" is the
 * Earth-Moon barycentre. The digits are the tables' own (data, not rounded here).
 *
 * Table 1 (valid 1800 AD - 2050 AD): transcribed from Standish, "Keplerian Elements for Approximate Positions of the Major Planets" (JPL Solar System Dynamics), Table 1.
 * Tables 2a and 2b (valid 3000 BC - 3000 AD): transcribed from JPL's p_elem_t2.txt as reproduced
 * verbatim in public repositories (two independent copies agreed digit for digit; which copies was
 * not recorded).
 */

export interface ElementRow {
  /** [a, e, I, L, varpi, Omega] at J2000 (au, -, deg, deg, deg, deg). */
  readonly at: readonly [number, number, number, number, number, number];
  /** Their rates per Julian century. */
  readonly rate: readonly [number, number, number, number, number, number];
  /** Table 2b terms for M: b T^2 + c cos(f T) + s sin(f T), b c s in deg, f in deg/Cy. */
  readonly b?: number;
  readonly c?: number;
  readonly s?: number;
  readonly f?: number;
}

/** Order of the bodies in both tables (the index used by the kernels). */
export const STANDISH_BODIES = ["Mercury", "Venus", "EM Bary", "Mars", "Jupiter", "Saturn", "Uranus", "Neptune", "Pluto"] as const;

// prettier-ignore
export const TABLE_1: readonly ElementRow[] = [
  { at: [ 0.38709927, 0.20563593,  7.00497902, 252.25032350,  77.45779628,  48.33076593], rate: [ 0.00000037,  0.00001906, -0.00594749, 149472.67411175,  0.16047689, -0.12534081] },
  { at: [ 0.72333566, 0.00677672,  3.39467605, 181.97909950, 131.60246718,  76.67984255], rate: [ 0.00000390, -0.00004107, -0.00078890,  58517.81538729,  0.00268329, -0.27769418] },
  { at: [ 1.00000261, 0.01671123, -0.00001531, 100.46457166, 102.93768193,   0.0       ], rate: [ 0.00000562, -0.00004392, -0.01294668,  35999.37244981,  0.32327364,  0.0       ] },
  { at: [ 1.52371034, 0.09339410,  1.84969142,  -4.55343205, -23.94362959,  49.55953891], rate: [ 0.00001847,  0.00007882, -0.00813131,  19140.30268499,  0.44441088, -0.29257343] },
  { at: [ 5.20288700, 0.04838624,  1.30439695,  34.39644051,  14.72847983, 100.47390909], rate: [-0.00011607, -0.00013253, -0.00183714,   3034.74612775,  0.21252668,  0.20469106] },
  { at: [ 9.53667594, 0.05386179,  2.48599187,  49.95424423,  92.59887831, 113.66242448], rate: [-0.00125060, -0.00050991,  0.00193609,   1222.49362201, -0.41897216, -0.28867794] },
  { at: [19.18916464, 0.04725744,  0.77263783, 313.23810451, 170.95427630,  74.01692503], rate: [-0.00196176, -0.00004397, -0.00242939,    428.48202785,  0.40805281,  0.04240589] },
  { at: [30.06992276, 0.00859048,  1.77004347, -55.12002969,  44.96476227, 131.78422574], rate: [ 0.00026291,  0.00005105,  0.00035372,    218.45945325, -0.32241464, -0.00508664] },
  { at: [39.48211675, 0.24882730, 17.14001206, 238.92903833, 224.06891629, 110.30393684], rate: [-0.00031596,  0.00005170,  0.00004818,    145.20780515, -0.04062942, -0.01183482] },
];

// prettier-ignore
export const TABLE_2: readonly ElementRow[] = [
  { at: [ 0.38709843, 0.20563661,  7.00559432, 252.25166724,  77.45771895,  48.33961819], rate: [ 0.00000000,  0.00002123, -0.00590158, 149472.67486623,  0.15940013, -0.12214182] },
  { at: [ 0.72332102, 0.00676399,  3.39777545, 181.97970850, 131.76755713,  76.67261496], rate: [-0.00000026, -0.00005107,  0.00043494,  58517.81560260,  0.05679648, -0.27274174] },
  { at: [ 1.00000018, 0.01673163, -0.00054346, 100.46691572, 102.93005885,  -5.11260389], rate: [-0.00000003, -0.00003661, -0.01337178,  35999.37306329,  0.31795260, -0.24123856] },
  { at: [ 1.52371243, 0.09336511,  1.85181869,  -4.56813164, -23.91744784,  49.71320984], rate: [ 0.00000097,  0.00009149, -0.00724757,  19140.29934243,  0.45223625, -0.26852431] },
  { at: [ 5.20248019, 0.04853590,  1.29861416,  34.33479152,  14.27495244, 100.29282654], rate: [-0.00002864,  0.00018026, -0.00322699,   3034.90371757,  0.18199196,  0.13024619],
    b: -0.00012452, c:  0.06064060, s: -0.35635438, f: 38.35125000 },
  { at: [ 9.54149883, 0.05550825,  2.49424102,  50.07571329,  92.86136063, 113.63998702], rate: [-0.00003065, -0.00032044,  0.00451969,   1222.11494724,  0.54179478, -0.25015002],
    b:  0.00025899, c: -0.13434469, s:  0.87320147, f: 38.35125000 },
  { at: [19.18797948, 0.04685740,  0.77298127, 314.20276625, 172.43404441,  73.96250215], rate: [-0.00020455, -0.00001550, -0.00180155,    428.49512595,  0.09266985,  0.05739699],
    b:  0.00058331, c: -0.97731848, s:  0.17689245, f:  7.67025000 },
  { at: [30.06952752, 0.00895439,  1.77005520, 304.22289287,  46.68158724, 131.78635853], rate: [ 0.00006447,  0.00000818,  0.00022400,    218.46515314,  0.01009938, -0.00606302],
    b: -0.00041348, c:  0.68346318, s: -0.10162547, f:  7.67025000 },
  { at: [39.48686035, 0.24885238, 17.14104260, 238.96535011, 224.09702598, 110.30167986], rate: [ 0.00449751,  0.00006016,  0.00000501,    145.18042903, -0.00968827, -0.00809981],
    b: -0.01262724 },
];

/**
 * Published approximate errors of the Keplerian formulation (the same JPL page, table
 * "Approximate Errors"): RA and Dec in arcsec, distance r in units of 1000 km, for Table 1 over
 * 1800-2050 and Table 2 over 3000 BC - 3000 AD. Row order as STANDISH_BODIES.
 */
// prettier-ignore
export const PUBLISHED_ERRORS: readonly { readonly table1: readonly [number, number, number]; readonly table2: readonly [number, number, number] }[] = [
  { table1: [ 15,  1,    1], table2: [  20,  15,    1] },
  { table1: [ 20,  1,    4], table2: [  40,  30,    8] },
  { table1: [ 20,  8,    6], table2: [  40,  15,   15] },
  { table1: [ 40,  2,   25], table2: [ 100,  40,   30] },
  { table1: [400, 10,  600], table2: [ 600, 100, 1000] },
  { table1: [600, 25, 1500], table2: [1000, 100, 4000] },
  { table1: [ 50,  2, 1000], table2: [2000,  30, 8000] },
  { table1: [ 10,  1,  200], table2: [ 400,  15, 4000] },
  { table1: [  5,  2,  300], table2: [ 400, 100, 2500] },
];

/** Astronomical unit, km (IAU 2012 Resolution B2), defined once in units.ts. */
export { AU_KM } from "./units";

/** Julian dates (TDB) bounding the tables. Table 1: 1800-01-01 00:00 to 2051-01-01 00:00 (Gregorian). */
export const TABLE_1_FIRST_JD = 2378496.5;
export const TABLE_1_END_JD = 2470172.5;
/** Table 2: 3000 BC (astronomical year -2999) January 1 00:00, Julian calendar, to 3001-01-01 00:00 Gregorian. */
export const TABLE_2_FIRST_JD = 625673.5;
export const TABLE_2_LAST_JD = 2817152.5;
