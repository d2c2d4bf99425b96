/** Published sources the catalogue cites; each Sourced.source is a key here. */
export interface Source {
  /** Short label shown in tables, e.g. "JPL DE440". */
  label: string;
  /** Full citation. */
  citation: string;
}

export const SOURCES: Record<string, Source> = {
  DE440: {
    label: "JPL DE440",
    citation: "Park, R. S. et al. (2021), The JPL Planetary and Lunar Ephemerides DE440 and DE441, AJ 161:105; NAIF kernel gm_de440.tpc",
  },
  IAU2015B3: {
    label: "IAU 2015 B3",
    citation: "IAU 2015 Resolution B3 on nominal solar and planetary conversion constants (Prša et al. 2016, AJ 152:41)",
  },
};
