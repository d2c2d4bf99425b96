import { describe, expect, it } from "vitest";
import { orbitCalls, rootOrbitCall, storedName, toEngineFormula, toStoredFormula, typedName } from "../../src/runner/names";

// The stored form is the one Excel writes for an Office.js custom function: the README of
// evelyn-chrono/officejs-custom-functions-name-error-repro (OfficeDev/office-js issue #6611)
// quotes the sheet XML `<f t="array" ref="A1">_xldudf_CONTOSO_ADD(1,2)</f>` for the typed
// `=CONTOSO.ADD(1,2)`; OfficeDev/Excel-Custom-Functions issue #108 (Microsoft) names the
// `_xldudf` prefix. Our namespace is ORBIT.

describe("function names", () => {
  it("types ORBIT.<ID> and stores _xldudf_ORBIT_<ID>, as Excel stores CONTOSO.ADD as _xldudf_CONTOSO_ADD", () => {
    expect(typedName("ORBITAL_SPEED")).toBe("ORBIT.ORBITAL_SPEED");
    expect(storedName("ORBITAL_SPEED")).toBe("_xldudf_ORBIT_ORBITAL_SPEED");
  });
});

describe("toEngineFormula", () => {
  it("turns the stored form into the typed form, in any letter case", () => {
    expect(toEngineFormula('_xldudf_ORBIT_ORBITAL_SPEED("Earth",A1)')).toBe('=ORBIT.ORBITAL_SPEED("Earth",A1)');
    expect(toEngineFormula('=_xldudf_orbit_orbital_speed("Earth",A1)')).toBe('=ORBIT.ORBITAL_SPEED("Earth",A1)');
  });

  it("drops a stray external-link prefix [n]! in front of the stored form (OfficeDev/office-js issue #2568)", () => {
    expect(toEngineFormula("[2]!_xldudf_ORBIT_BODY_GM(A1)*2")).toBe("=ORBIT.BODY_GM(A1)*2");
  });

  it("keeps typed names, and rewrites every call in a nested formula", () => {
    expect(toEngineFormula("=ORBIT.ORBITAL_SPEED(A1, _xldudf_ORBIT_ALTITUDE_TO_RADIUS(A1, 690))")).toBe("=ORBIT.ORBITAL_SPEED(A1, ORBIT.ALTITUDE_TO_RADIUS(A1, 690))");
  });

  it("leaves text inside string literals and quoted sheet names alone", () => {
    expect(toEngineFormula('=CONCAT("_xldudf_ORBIT_X(", \'TRUE sheet\'!A1, "TRUE")')).toBe('=CONCAT("_xldudf_ORBIT_X(", \'TRUE sheet\'!A1, "TRUE")');
    expect(toEngineFormula('="say ""_xldudf_ORBIT_BODY_GM(1)"""')).toBe('="say ""_xldudf_ORBIT_BODY_GM(1)"""');
  });

  it("writes the boolean words as the engine's TRUE() and FALSE(), but not inside names or calls", () => {
    expect(toEngineFormula("=ORBIT.SHAPE_FROM_APSES(A1, B1, TRUE)")).toBe("=ORBIT.SHAPE_FROM_APSES(A1, B1, TRUE())");
    expect(toEngineFormula("=IF(false, 1, TRUE())")).toBe("=IF(FALSE(), 1, TRUE())");
    expect(toEngineFormula("=TRUEVALUE+TRUE!A1")).toBe("=TRUEVALUE+TRUE!A1");
  });

  it("drops Excel's _xlfn. and _xlws. prefixes of newer built-in functions", () => {
    expect(toEngineFormula("=_xlfn._xlws.SORT(A1:A3)+_xlfn.CONCAT(1)")).toBe("=SORT(A1:A3)+CONCAT(1)");
  });
});

describe("toStoredFormula", () => {
  it("writes every ORBIT call in the stored form and keeps the rest as written", () => {
    expect(toStoredFormula('=orbit.orbital_speed("Earth", B2:B9)*1000+_xlfn.CONCAT("ORBIT.X(")')).toBe(
      '_xldudf_ORBIT_ORBITAL_SPEED("Earth", B2:B9)*1000+_xlfn.CONCAT("ORBIT.X(")',
    );
    expect(toStoredFormula("_xldudf_orbit_body_gm(A1)")).toBe("_xldudf_ORBIT_BODY_GM(A1)");
  });

  it("round-trips with toEngineFormula", () => {
    const typed = '=ORBIT.TRANSFER_BURNS("Earth", B17, ORBIT.ALTITUDE_TO_RADIUS("Earth", 690), , TRUE())';
    expect(toEngineFormula(toStoredFormula(typed))).toBe(typed);
  });
});

describe("recognising ORBIT calls", () => {
  it("lists the ids a formula calls, in either form", () => {
    expect(orbitCalls('=ORBIT.A_B(1)+_xldudf_ORBIT_C(2)+SUM(3)+"ORBIT.D(4)"')).toEqual(["A_B", "C"]);
    expect(orbitCalls("=SUM(A1:A3)")).toEqual([]);
  });

  it("finds the call that is the whole formula, and only that", () => {
    expect(rootOrbitCall('=ORBIT.BODY_TABLE("gm", A1:A3, TRUE)')).toBe("BODY_TABLE");
    expect(rootOrbitCall("_xldudf_ORBIT_BURN_SEQUENCE(B2:B5, C2:C5, 180)")).toBe("BURN_SEQUENCE");
    expect(rootOrbitCall('=ORBIT.BODY_GM("Earth")*2')).toBeUndefined();
    expect(rootOrbitCall('=ORBIT.BODY_GM(")")+ORBIT.BODY_GM("Moon")')).toBeUndefined();
    expect(rootOrbitCall("=2*ORBIT.BODY_GM(A1)")).toBeUndefined();
  });
});
