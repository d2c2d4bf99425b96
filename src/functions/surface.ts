import { DomainError, formatValue } from "../core/domain";

/**
 * The surface check: a distance from a body's centre below the body's surface is the commonest
 * spreadsheet slip (an altitude typed where a radius belongs), so every function that takes such a
 * distance and knows the body refuses it, in these words, with the radius it probably meant. The
 * surface itself stays valid (escape speed from the surface is a common question). The body is
 * known when it is a catalogue name (its equatorial radius) or when body_radius is given with a
 * GM number; a bare GM says nothing about the surface, so nothing is checked then.
 */

/** What the check knows of the body: a name for the message and the radius of its surface, km. */
export interface Surface {
  readonly name: string;
  readonly radius: number;
}

const km = (x: number): string => `${formatValue(x)} km`;

/** A distance from the centre (a radius, periapsis or parking radius) below the surface. */
export function radiusInside(parameter: string, value: number, s: Surface): DomainError {
  return new DomainError(
    "bad_argument",
    parameter,
    `${parameter}: got ${km(value)}, inside ${s.name} (radius ${km(s.radius)}). Radii are from the centre: an altitude of ${km(value)} is a radius of ${km(s.radius + value)}; ALTITUDE_TO_RADIUS converts.`,
  );
}

/** A positive semi-major axis below the surface: no orbit of that size clears the body. */
export function smaInside(parameter: string, value: number, s: Surface): DomainError {
  return new DomainError(
    "bad_argument",
    parameter,
    `${parameter}: got ${km(value)}, inside ${s.name} (radius ${km(s.radius)}), so the orbit would pass through the body. A semi-major axis is from the centre: an orbit at ${km(value)} altitude has an sma of ${km(s.radius + value)}; ALTITUDE_TO_RADIUS converts.`,
  );
}

/** A position vector whose length is below the surface. */
export function positionInside(parameter: string, distance: number, s: Surface): DomainError {
  return new DomainError(
    "bad_argument",
    parameter,
    `${parameter}: got a position ${km(distance)} from the centre, inside ${s.name} (radius ${km(s.radius)}). Positions are from the body's centre, in km.`,
  );
}

/**
 * An orbit whose farthest point is still below the surface (a conic's apoapsis a(1 + e), or 2a
 * for any orbit of that sma): no part of it is above the body, so the sma is almost surely an
 * altitude. (An sma below the radius with the apoapsis above it is a ballistic arc, and stays valid.)
 */
export function orbitInside(parameter: string, sma: number, farthest: number, s: Surface, bound = "reaches at most"): DomainError {
  return new DomainError(
    "bad_argument",
    parameter,
    `${parameter}: got ${km(sma)}, an orbit that ${bound} ${km(farthest)} from the centre, inside ${s.name} (radius ${km(s.radius)}) all the way round. A semi-major axis is from the centre: an orbit at ${km(sma)} altitude has an sma of ${km(s.radius + sma)}; ALTITUDE_TO_RADIUS converts.`,
  );
}

/** Elements that put the position itself inside the body. */
export function elementsInside(parameter: string, sma: number, distance: number, s: Surface): DomainError {
  return new DomainError(
    "bad_argument",
    parameter,
    `${parameter}: got ${km(sma)}, which puts the position ${km(Number(distance.toPrecision(6)))} from the centre, inside ${s.name} (radius ${km(s.radius)}). A semi-major axis is from the centre: an orbit at ${km(sma)} altitude has an sma of ${km(s.radius + sma)}; ALTITUDE_TO_RADIUS converts.`,
  );
}

const plain = (x: number): string => formatValue(Number(x.toPrecision(10)));

/** A period whose orbit lies inside the body: most often minutes or hours typed where seconds belong. */
export function periodInside(parameter: string, period: number, sma: number, s: Surface): DomainError {
  return new DomainError(
    "bad_argument",
    parameter,
    `${parameter}: got ${plain(period)} s, the period of an orbit with an sma of ${km(Number(sma.toPrecision(4)))}, inside ${s.name} (radius ${km(s.radius)}). Periods are in seconds: ${plain(period)} minutes is ${plain(period * 60)} s, ${plain(period)} hours is ${plain(period * 3600)} s.`,
  );
}
