/**
 * Invented data for the Skerry demo scenario (README: demo scenario). Nothing here is a real
 * object or place: the catalogue number 99001, designator 26999A and the ground station's
 * coordinates are made up.
 */

/** An invented element set for Skerry-1: about 690 km, sun-synchronous (98.19 deg), epoch 2026-05-30 12:00 UTC; checksums valid. */
export const SKERRY_LINE1 = "1 99001U 26999A   26150.50000000  .00000210  00000-0  21000-4 0  9993";
export const SKERRY_LINE2 = "2 99001  98.1900 135.0000 0001200  90.0000 270.0000 14.60983543  1057";
/** The element set's epoch, Julian date (UTC). */
export const SKERRY_EPOCH_JD = 2461191.0;

/** An invented ground station: geodetic latitude and longitude (deg), height (km). */
export const SKERRY_STATION = { latitude: 58.21, longitude: -6.39, height: 0.05 } as const;
