/**
 * The Skerry-1 element set and the Skerry Ground station are the scenario's, invented like all of
 * it (src/scenario/story.ts: SKERRY_1_TLE, SKERRY_GROUND; the demo sheet "Ground contact" writes
 * them into its input cells). The tests read them there; this file keeps what only tests need.
 */

/** The element set's epoch, Julian date (UTC): line 1's epoch field 26150.50000000 is 2026, day 150.5, 2026-05-30 12:00 UTC. */
export const SKERRY_EPOCH_JD = 2461191.0;
