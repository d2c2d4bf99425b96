import { describe, expect, it } from "vitest";
import { isDomainError } from "../../src/core/domain";
import { resolveSolarFlux, resolveStartDate, type FluxSchedule } from "../../src/core/solarflux";
import { expectError, ok } from "../support/expect";

const sched = (x: Parameters<typeof resolveSolarFlux>[0]): FluxSchedule => ok(resolveSolarFlux(x));

describe("solar flux schedule", () => {
  it("a number is held constant; omitted is 150 sfu", () => {
    expect(sched(120).at(2460000)).toBe(120);
    expect(sched(null).at(2470000)).toBe(150);
    expect(sched(120).constant).toBe(true);
  });

  it("a forecast is interpolated linearly in time, the first value held before it and the last after it", () => {
    const s = sched([[2461000.5, 100], [2461030.5, 160], [2461090.5, 130]]);
    expect(s.at(2461000.5)).toBe(100);
    expect(s.at(2461015.5)).toBe(130);
    expect(s.at(2461060.5)).toBe(145);
    expect(s.at(2460000)).toBe(100);
    expect(s.at(2470000)).toBe(130);
    expect(Array.from(s.dates)).toEqual([2461000.5, 2461030.5, 2461090.5]);
    // out-of-order queries still find their interval
    expect(s.at(2461015.5)).toBe(130);
  });

  it("refuses a malformed forecast, naming solar_flux", () => {
    expectError(resolveSolarFlux([]), "bad_argument", "solar_flux");
    expectError(resolveSolarFlux([[2461000.5, 100], [2461000.5, 120]]), "bad_argument", "solar_flux");
    expectError(resolveSolarFlux([[2461000.5, 100, 3]]), "bad_argument", "solar_flux");
    expectError(resolveSolarFlux([[2461000.5, -100]]), "bad_argument", "solar_flux");
    expectError(resolveSolarFlux([[2461000.5, 1000]]), "no_answer", "solar_flux");
    expectError(resolveSolarFlux([[12, 100]]), "bad_argument", "solar_flux");
    expectError(resolveSolarFlux(Number.POSITIVE_INFINITY), "bad_argument", "solar_flux");
  });

  it("the start date defaults to the forecast's first date", () => {
    const s = sched([[2461000.5, 100], [2461030.5, 160]]);
    expect(resolveStartDate(null, s)).toBe(2461000.5);
    expect(resolveStartDate(2461010, s)).toBe(2461010);
    expect(isDomainError(resolveStartDate(5, s))).toBe(true);
  });
});
