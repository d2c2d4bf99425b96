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

  it("a forecast follows the natural cubic spline through its rows, the first value held before it and the last after it", () => {
    const s = sched([[2461000.5, 100], [2461030.5, 160], [2461090.5, 130]]);
    expect(s.at(2461000.5)).toBe(100);
    expect(s.at(2461030.5)).toBe(160);
    expect(s.at(2461090.5)).toBe(130);
    // Natural spline by hand (Press et al., Numerical Recipes, 3rd ed., eq. 3.3.7 with zero end
    // curvatures): knots 0, 30, 90 days, so 2 (30 + 60) M1 = 6 ((130 - 160) / 60 - (160 - 100) / 30),
    // M1 = -1/12; at 15 days 130 + (1/8 - 1/2) M1 30^2 / 6 = 134.6875, at 60 days
    // 145 + (1/8 - 1/2) M1 60^2 / 6 = 163.75.
    expect(s.at(2461015.5)).toBeCloseTo(134.6875, 9);
    expect(s.at(2461060.5)).toBeCloseTo(163.75, 9);
    expect(s.at(2460000)).toBe(100);
    expect(s.at(2470000)).toBe(130);
    // the flux has corners only where the holding begins and ends
    expect(Array.from(s.dates)).toEqual([2461000.5, 2461090.5]);
    // out-of-order queries still find their interval
    expect(s.at(2461015.5)).toBeCloseTo(134.6875, 9);
  });

  it("two rows give the straight line between them; one row is a constant", () => {
    const s = sched([[2461000.5, 100], [2461040.5, 180]]);
    expect(s.at(2461010.5)).toBeCloseTo(120, 10);
    expect(s.at(2461030.5)).toBeCloseTo(160, 10);
    const one = sched([[2461000.5, 90]]);
    expect(one.constant).toBe(true);
    expect(one.at(2471000)).toBe(90);
    expect(resolveStartDate(null, one)).toBe(2461000.5);
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
