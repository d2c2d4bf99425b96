import { describe, expect, it } from "vitest";
import { newMsisOutput, nrlmsise00, STANDARD_SWITCHES } from "../../src/core/nrlmsise00";
import { nrlmsise00MeanDensities, nrlmsise00MeanDensity } from "../../src/core/nrlmsise00mean";

/** The same mean by a much finer rule: 16 latitudes (midpoint in sin(latitude)), 24 local times, 4 days. */
function fineMean(alt: number, f107: number, f107A: number, ap: number): number {
  const out = newMsisOutput();
  const sw = STANDARD_SWITCHES.map((s, i) => (i === 10 ? 0 : s));
  let sum = 0;
  for (const q of [0.5, 1.5, 2.5, 3.5])
    for (let i = 0; i < 16; i++) {
      const lat = (Math.asin(-1 + (2 * (i + 0.5)) / 16) * 180) / Math.PI;
      for (let j = 0; j < 24; j++) sum += nrlmsise00({ doy: (365.25 * q) / 4, sec: 0, alt, gLat: lat, gLong: 0, lst: j, f107, f107A, ap }, out, true, sw).d[5];
    }
  return sum / (4 * 16 * 24);
}

describe("global mean NRLMSISE-00 density", () => {
  it("agrees with a 16 x 24 x 4 rule to 0.2 % from 100 to 1000 km at low, moderate and high activity", () => {
    for (const f of [70, 150, 250])
      for (const h of [100, 200, 400, 700, 1000]) {
        const rel = nrlmsise00MeanDensity(h, f, f, 15) / fineMean(h, f, f, 15) - 1;
        expect(Math.abs(rel), `${h} km, ${f} sfu`).toBeLessThan(2e-3);
      }
  });

  it("the altitude sweep gives the same numbers as altitude-by-altitude calls (to rounding)", () => {
    const hs = [65, 72.5, 90, 123, 300, 650, 1000];
    const sweep = nrlmsise00MeanDensities(hs, 180, 160, 30);
    hs.forEach((h, i) => expect(sweep[i] / nrlmsise00MeanDensity(h, 180, 160, 30) - 1).toBeCloseTo(0, 13));
  });

  it("rises with F10.7, with its 81-day mean and with Ap in the thermosphere", () => {
    for (const h of [250, 400, 800]) {
      expect(nrlmsise00MeanDensity(h, 200, 150, 15)).toBeGreaterThan(nrlmsise00MeanDensity(h, 150, 150, 15));
      expect(nrlmsise00MeanDensity(h, 150, 200, 15)).toBeGreaterThan(nrlmsise00MeanDensity(h, 150, 150, 15));
      expect(nrlmsise00MeanDensity(h, 150, 150, 50)).toBeGreaterThan(nrlmsise00MeanDensity(h, 150, 150, 15));
    }
  });

  // Looser checks: Vallado 4th ed. Table 8-4 (CIRA-72, moderate activity) has 3.725e-12 kg/m^3 at
  // 400 km; between solar minimum and maximum the density there changes by about an order of
  // magnitude (from memory).
  it("has the published order of magnitude at 400 km, and a solar-cycle swing of more than 5x", () => {
    const moderate = nrlmsise00MeanDensity(400, 150, 150, 15);
    expect(moderate).toBeGreaterThan(1.5e-12);
    expect(moderate).toBeLessThan(1e-11);
    expect(nrlmsise00MeanDensity(400, 250, 250, 15) / nrlmsise00MeanDensity(400, 70, 70, 15)).toBeGreaterThan(5);
  });
});
