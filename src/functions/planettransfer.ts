import { planetTransfer as coplanarHohmann } from "../core/planettransfer";
import { withAll } from "../core/domain";
import { gmOf, orbitOf, sharedParentOf } from "./bodyargs";
import { lift, row } from "./lift";
import { body } from "./params";

// Family "Interplanetary" (DESIGN.md §4): the first look at a transfer between two bodies about a
// common parent. The parent's own GM is used (for planets, the Sun's: the spacecraft's transfer
// orbit is about the Sun; the planets' masses are neglected), with each body's catalogue sma as
// the radius of a circular orbit in one plane.

const f = {
  planetTransfer: lift(
    row("v∞ out (km/s)", "v∞ in (km/s)", "time of flight (s)", "phase angle (deg)", "synodic period (s)"),
    [body("from"), body("to")],
    (from, to) =>
      withAll([sharedParentOf(from, to, "from", "to"), orbitOf(from, "from"), orbitOf(to, "to")], (parent, a, b) =>
        coplanarHohmann(gmOf(parent), a.sma.value, b.sma.value),
      ),
  ),
};

/**
 * Hohmann transfer between two catalogue bodies about a common parent (e.g. Earth to Mars about the Sun), both taken on circular orbits of their catalogue semi-major axes in one plane, with the parent's own GM (the Sun's for planets). A preliminary two-body estimate: real orbits are eccentric and inclined, so real excess speeds, dates and flight times differ, for Mars markedly from one opportunity to the next. The synodic period here is the circular model's; SYNODIC_PERIOD uses the catalogue periods.
 * @customfunction PLANET_TRANSFER
 * @helpurl https://localhost:3000/reference.html#planet_transfer
 * @param from Catalogue body the transfer leaves, e.g. "Earth".
 * @param to Catalogue body the transfer reaches, orbiting the same parent, e.g. "Mars".
 * @param [include_header] TRUE puts a header row of labels on top.
 * @returns One row per case: v∞ out at departure (km/s), v∞ in at arrival (km/s), time of flight (s), phase angle of the target ahead of the departure body at departure (deg, −180 to 180; negative: behind), synodic period (s).
 */
export function planetTransfer(from: any[][], to: any[][], include_header?: any[][]): any[][] {
  return f.planetTransfer(from, to, include_header);
}
