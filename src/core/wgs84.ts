/**
 * The World Geodetic System 1984 in sheet units (km, km^3/s^2, rad/s): the one home of the WGS 84
 * constants in the core. Defining parameters from NIMA TR8350.2, "Department of Defense World
 * Geodetic System 1984: Its Definition and Relationships with Local Geodetic Systems", 3rd ed.
 * (2000), Table 3.1; derived values computed from them here (the report's Table 3.3 lists the same
 * derived numbers to its printed digits: b = 6356752.3142 m, e^2 = 6.69437999014e-3).
 *
 * The body catalogue holds its own Earth values (DE440 GM, EGM2008 J2) for the two-body and J2
 * families; the ground-geometry functions use this ellipsoid throughout so that a site's
 * geodetic coordinates, its Earth-fixed position and the coverage closed forms agree with one
 * another and with GPS-derived site coordinates.
 */

/** Semi-major axis a = 6378137.0 m, exact (TR8350.2 Table 3.1). */
export const WGS84_A = 6378.137;
/** Flattening f = 1/298.257223563, exact by definition (TR8350.2 Table 3.1). */
export const WGS84_F = 1 / 298.257223563;
/** GM including the atmosphere, 3986004.418e8 m^3/s^2 (TR8350.2 Table 3.1). */
export const WGS84_GM = 398600.4418;
/** Nominal mean angular velocity of the Earth, 7292115.0e-11 rad/s (TR8350.2 Table 3.1). */
export const WGS84_OMEGA = 7.292115e-5;
/**
 * Second zonal harmonic of the WGS 84 gravity model, J2 = -sqrt(5) C20bar with the normalised
 * C20bar = -0.484166774985e-3 of the WGS 84 ellipsoid (TR8350.2 Table 3.1): 1.082629821e-3.
 */
export const WGS84_J2 = -Math.sqrt(5) * -0.484166774985e-3;
/** First eccentricity squared e^2 = f (2 - f). */
export const WGS84_E2 = WGS84_F * (2 - WGS84_F);
/** Semi-minor axis b = a (1 - f), km. */
export const WGS84_B = WGS84_A * (1 - WGS84_F);
