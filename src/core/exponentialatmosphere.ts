/**
 * The static piecewise-exponential atmosphere of Vallado, Fundamentals of Astrodynamics and
 * Applications, 4th ed. (2013), Table 8-4 ("exponential atmospheric model"; from CIRA-72 at
 * moderate activity): in each altitude band the density falls from the band's nominal density
 * at its base altitude with the band's own scale height, rho = rho0 exp(-(h - h0) / H). No solar
 * or geomagnetic dependence, no day-night or seasonal change. Published range 0-1000 km; the
 * last row (base 1000 km) serves above it.
 *
 * The rows were read from JuliaSpace/SatelliteToolboxAtmosphericModels.jl
 * (src/exponential/constants.jl, which cites the 4th edition) and agree with the values recalled
 * from the book (from memory). Check on the transcription (test/core/exponentialatmosphere.test.ts):
 * each band's density carried up its scale height to the next base altitude lands on the next
 * band's base density to 0.14 % at 25 km and 0.01 % at every other boundary, which a mistyped
 * digit would break.
 */

/** Base altitude h0 (km), nominal density rho0 (kg/m^3), scale height H (km), lowest band first. */
export const EXPONENTIAL_TABLE: readonly (readonly [number, number, number])[] = [
  [0, 1.225, 7.249],
  [25, 3.899e-2, 6.349],
  [30, 1.774e-2, 6.682],
  [40, 3.972e-3, 7.554],
  [50, 1.057e-3, 8.382],
  [60, 3.206e-4, 7.714],
  [70, 8.77e-5, 6.549],
  [80, 1.905e-5, 5.799],
  [90, 3.396e-6, 5.382],
  [100, 5.297e-7, 5.877],
  [110, 9.661e-8, 7.263],
  [120, 2.438e-8, 9.473],
  [130, 8.484e-9, 12.636],
  [140, 3.845e-9, 16.149],
  [150, 2.07e-9, 22.523],
  [180, 5.464e-10, 29.74],
  [200, 2.789e-10, 37.105],
  [250, 7.248e-11, 45.546],
  [300, 2.418e-11, 53.628],
  [350, 9.518e-12, 53.298],
  [400, 3.725e-12, 58.515],
  [450, 1.585e-12, 60.828],
  [500, 6.967e-13, 63.822],
  [600, 1.454e-13, 71.835],
  [700, 3.614e-14, 88.667],
  [800, 1.17e-14, 124.64],
  [900, 5.245e-15, 181.05],
  [1000, 3.019e-15, 268.0],
];

/** Index of the band whose base is the highest at or below h (h >= 0). */
export function exponentialBand(altitude: number): number {
  let lo = 0;
  let hi = EXPONENTIAL_TABLE.length - 1;
  if (altitude >= EXPONENTIAL_TABLE[hi][0]) return hi;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (EXPONENTIAL_TABLE[mid][0] <= altitude) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Kernel: density (kg/m^3) at altitude (km, >= 0; the caller checks the range) in the exponential
 * model. Exactly the table's rho0 at each base altitude; between bases, one exp. Accuracy: that
 * of the model, a static mean that can be off by a factor of several from the real density at
 * 400-1000 km, where solar activity moves it most.
 */
export function exponentialDensity(altitude: number): number {
  const [h0, rho0, scale] = EXPONENTIAL_TABLE[exponentialBand(altitude)];
  return rho0 * Math.exp(-(altitude - h0) / scale);
}

/** Kernel: the local scale height (km) of the exponential model at altitude (km): the band's H. */
export const exponentialScaleHeight = (altitude: number): number => EXPONENTIAL_TABLE[exponentialBand(altitude)][2];
