/** Published sources the catalogue cites; each Sourced.source is a key here. */
export interface Source {
  /** Short label shown in tables, e.g. "JPL DE440". */
  label: string;
  /** Full citation. */
  citation: string;
}

/*
 * Where the digits were read. The project has no network access to the primary files, so each
 * value was read from a stored public copy of the source (named below) and, where possible, from
 * two independent copies that agree digit for digit. The citation names the primary source; a
 * value that could not be found in any stored copy carries `fromMemory: true` in bodies.ts.
 */
export const SOURCES: Record<string, Source> = {
  DE440: {
    label: "JPL DE440",
    citation:
      "Park, R. S., Folkner, W. M., Williams, J. G., Boggs, D. H. (2021), The JPL Planetary and Lunar Ephemerides " +
      "DE440 and DE441, AJ 161:105, doi:10.3847/1538-3881/abd414; GM values as in the NAIF kernel gm_de440.tpc " +
      "(BODY10, BODY1-9 barycentres, BODY199-999, BODY301)",
  },
  GM_DE440_SATELLITES: {
    label: "NAIF gm_de440.tpc (satellites)",
    citation:
      "NAIF generic kernel pck/gm_de440.tpc (JPL, distributed with DE440): satellite GM values, which JPL takes from " +
      "its satellite ephemeris solutions (Mars MAR097, Jupiter JUP365, Saturn SAT-series, Uranus URA111 (Jacobson, " +
      "R. A. (2014), AJ 148:76, whose Table 12 prints the same five Uranian moon GMs rounded to 0.1 km^3/s^2), Neptune " +
      "NEP-series, Pluto PLU-series); read from two independent stored copies of the kernel's values",
  },
  DE440_ASTEROIDS: {
    label: "JPL DE440 asteroid masses",
    citation:
      "Park et al. (2021), AJ 161:105 (DE440/DE441): GM of the 16 asteroid perturbers (SB441-N16), as listed in JPL " +
      "gm_Horizons.pck (BODY2000001, BODY2000004) and in the DE440 perturber tables that copy it",
  },
  IAU2015B3: {
    label: "IAU 2015 B3",
    citation:
      "IAU 2015 Resolution B3 on recommended nominal conversion constants for selected solar and planetary properties " +
      "(Prša, A. et al. 2016, AJ 152:41, arXiv:1510.07674); exact by definition",
  },
  JPL_SSD_PLANETS: {
    label: "JPL SSD planet physical parameters",
    citation:
      "JPL Solar System Dynamics, Planets: Physical Parameters, ssd.jpl.nasa.gov/planets/phys_par.html (radii from " +
      "the IAU WGCCRE report, Archinal et al. 2018, CMDA 130:22; sidereal rotation and orbit periods as tabulated " +
      "there; 'y' is the Julian year of 365.25 d)",
  },
  JPL_SSD_SATELLITES: {
    label: "JPL SSD satellite physical parameters",
    citation:
      "JPL Solar System Dynamics, Planetary Satellite Physical Parameters, ssd.jpl.nasa.gov/sats/phys_par/ " +
      "(mean radius: radius of the sphere of equal volume)",
  },
  WGCCRE2015: {
    label: "IAU WGCCRE 2015",
    citation:
      "Archinal, B. A. et al. (2018), Report of the IAU Working Group on Cartographic Coordinates and Rotational " +
      "Elements: 2015, Celest. Mech. Dyn. Astr. 130:22, as encoded in the NAIF kernel pck00011.tpc (triaxial " +
      "radii a, b, c with a toward the parent for a locked moon; prime-meridian rates W-dot in deg/day)",
  },
  WGCCRE2009: {
    label: "IAU WGCCRE 2009",
    citation:
      "Archinal, B. A. et al. (2011), Report of the IAU Working Group on Cartographic Coordinates and Rotational " +
      "Elements: 2009, Celest. Mech. Dyn. Astr. 109:101 (Sun: W = 84.176 deg + 14.1844000 deg/day d)",
  },
  EGM2008: {
    label: "EGM2008 (tide-free)",
    citation:
      "Pavlis, N. K., Holmes, S. A., Kenyon, S. C., Factor, J. K. (2012), The development and evaluation of the Earth " +
      "Gravitational Model 2008 (EGM2008), J. Geophys. Res. 117:B04406; NGA coefficient file EGM2008_to2190_TideFree " +
      "(normalised C20 = -0.484165143790815e-3, reference radius a = 6378136.3 m, GM = 3.986004415e14 m^3/s^2)",
  },
  WGS84: {
    label: "NIMA TR8350.2 (WGS 84)",
    citation:
      "National Imagery and Mapping Agency (2000), Department of Defense World Geodetic System 1984: Its Definition " +
      "and Relationships with Local Geodetic Systems, NIMA TR8350.2, 3rd ed., Amendment 1: the four defining " +
      "parameters a = 6378137.0 m, 1/f = 298.257223563, GM = 3986004.418e8 m^3/s^2 (with the atmosphere), " +
      "omega = 7292115.0e-11 rad/s, and the normalised C20bar = -0.484166774985e-3; read from two stored public " +
      "copies that agree (the boule documentation's WGS84 page and the in-dubio-pro-geo.de WGS84 register)",
  },
  NSSDC: {
    label: "NASA NSSDC fact sheets",
    citation:
      "Williams, D. R., NASA Goddard Space Flight Center, NSSDC Planetary Fact Sheets (Venus, Mars, Moon), " +
      "nssdc.gsfc.nasa.gov/planetary/factsheet/",
  },
  KONOPLIV2011: {
    label: "Konopliv et al. 2011 (MRO110B2)",
    citation:
      "Konopliv, A. S. et al. (2011), Mars high resolution gravity fields from MRO, Mars seasonal gravity, and other " +
      "dynamical parameters, Icarus 211:401-428 (MRO110B2 field, reference radius 3396 km)",
  },
  IESS2018: {
    label: "Iess et al. 2018 (Juno)",
    citation:
      "Iess, L. et al. (2018), Measurement of Jupiter's asymmetric gravity field, Nature 555:220-222 " +
      "(J2 = 14696.5063e-6 at reference radius 71492 km)",
  },
  IESS2019: {
    label: "Iess et al. 2019 (Cassini)",
    citation:
      "Iess, L. et al. (2019), Measurement and implications of Saturn's gravity field and ring mass, Science " +
      "364:eaat2965 (J2 = 16290.573e-6 at reference radius 60330 km)",
  },
  JACOBSON2014: {
    label: "Jacobson 2014 (Uranus)",
    citation:
      "Jacobson, R. A. (2014), The orbits of the Uranian satellites and rings, the gravity field of the Uranian " +
      "system, and the orientation of the pole of Uranus, AJ 148:76 (J2 at reference radius 25559 km)",
  },
  JACOBSON2009: {
    label: "Jacobson 2009 (Neptune)",
    citation:
      "Jacobson, R. A. (2009), The orbits of the Neptunian satellites and the orientation of the pole of Neptune, " +
      "AJ 137:4322-4329 (J2 at reference radius 25225 km)",
  },
  SMITH2012: {
    label: "Smith et al. 2012 (MESSENGER)",
    citation:
      "Smith, D. E. et al. (2012), Gravity field and internal structure of Mercury from MESSENGER, Science " +
      "336:214-217 (J2 at reference radius 2440 km)",
  },
  FOLKNER2014: {
    label: "JPL DE430 (Folkner et al. 2014)",
    citation:
      "Folkner, W. M., Williams, J. G., Boggs, D. H., Park, R. S., Kuchynka, P. (2014), The Planetary and Lunar " +
      "Ephemerides DE430 and DE431, IPN Progress Report 42-196 (solar J2 with reference radius 696000 km)",
  },
  STANDISH: {
    label: "Standish, JPL approximate elements",
    citation:
      "Standish, E. M., Keplerian Elements for Approximate Positions of the Major Planets, JPL SSD, " +
      "ssd.jpl.nasa.gov/planets/approx_pos.html, Table 1 (valid 1800-2050; mean ecliptic and equinox of J2000; " +
      "values at J2000 = JD 2451545.0 TDB and rates per Julian century; au = 149 597 870.7 km, IAU 2012 B2)",
  },
  JPL_SAT_ELEM: {
    label: "JPL SSD satellite mean elements",
    citation:
      "JPL Solar System Dynamics, Planetary Satellite Mean Orbital Parameters, ssd.jpl.nasa.gov/?sat_elem " +
      "(Moon: mean ecliptic elements, epoch 2000 Jan 1.5 TT, DE405/LE405; Mars satellites: Laplace-plane elements, " +
      "epoch 1950 Jan 1.0 TT, MAR080; Jupiter satellites: Laplace planes, epoch 1997 Jan 16.0 TT; Saturn, Neptune " +
      "and Pluto satellites: Laplace planes, as tabulated there). Not meant for ephemeris computation",
  },
  JPL_SAT_ELEM_URA182: {
    label: "JPL SSD satellite mean elements (URA182)",
    citation:
      "JPL Solar System Dynamics, Planetary Satellite Mean Elements, ssd.jpl.nasa.gov/sats/elem/, Uranian satellites " +
      "from the URA182 solution (Jacobson, R. A., Park, R. S. (2025), The orbits of Uranus, its satellites and rings, " +
      "the gravity field of the Uranian system, and the orientation of the poles of Uranus and its satellites, AJ " +
      "169:65): mean elements referred to Uranus's equator with the pole along the satellites' orbital angular " +
      "momentum (the IAU south pole of Uranus), epoch 2000 Jan 1.5 TDB; a and P as in that paper's Table 6, e and i " +
      "as rounded in the JPL table. Not meant for ephemeris computation",
  },
  SBDB: {
    label: "JPL Small-Body Database",
    citation:
      "JPL Small-Body Database (SBDB API, ssd-api.jpl.nasa.gov/sbdb.api): osculating heliocentric ecliptic J2000 " +
      "elements at epoch JD 2461200.5 TDB (2026-Jun-19), 1 Ceres orbit solution 48 and 4 Vesta orbit solution 36 " +
      "(both DE441-based, solution date 2021-04-13)",
  },
  PARK2016: {
    label: "Park et al. 2016 (Dawn, Ceres)",
    citation:
      "Park, R. S. et al. (2016), A partially differentiated interior for (1) Ceres deduced from its gravity field " +
      "and shape, Nature 537:515-517 (effective diameter 939.4 km; extent 964.4 x 964.2 x 891.8 km; spin rate " +
      "952.1532 deg/day), as tabulated in JPL SBDB phys_par",
  },
  PARK2025: {
    label: "Park et al. 2025 (Dawn, Vesta)",
    citation:
      "Park, R. S. et al. (2025), Nature Astronomy, doi:10.1038/s41550-025-02533-7 (Vesta: effective diameter " +
      "522.77 km; extent 569.24 x 554.48 x 452.66 km; rotation period 5.3421276322 h), as tabulated in JPL SBDB " +
      "phys_par",
  },
  IAU2006: {
    label: "IAU 2006 B5, B6",
    citation:
      "IAU 2006 General Assembly, Resolution B5 (Definition of a Planet in the Solar System) and Resolution B6 " +
      "(Pluto): planets, dwarf planets and small Solar System bodies",
  },
};
