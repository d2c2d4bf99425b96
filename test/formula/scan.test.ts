import { describe, expect, it } from "vitest";
import { NAMESPACE, storedName, typedName } from "../../src/formula/namespace";
import { callArguments, callsOrbit, orbitCallAt, orbitCalls, rootOrbitCall, skipBracketed, skipQuoted, walkTokens } from "../../src/formula/scan";

// The stored form is the one Excel writes for an Office.js custom function: the README of
// evelyn-chrono/officejs-custom-functions-name-error-repro (OfficeDev/office-js issue #6611)
// quotes the sheet XML `<f t="array" ref="A1">_xldudf_CONTOSO_ADD(1,2)</f>` for the typed
// `=CONTOSO.ADD(1,2)`; OfficeDev/Excel-Custom-Functions issue #108 (Microsoft) names the
// `_xldudf` prefix. Lexical rules: ECMA-376 Part 1, §18.17.2 Syntax and §18.17.2.1 Constants
// (string-constant: a double quote inside is written twice).

describe("the namespace", () => {
  it("types ORBIT.<ID> and stores _xldudf_ORBIT_<ID>, as Excel stores CONTOSO.ADD as _xldudf_CONTOSO_ADD", () => {
    expect(NAMESPACE).toBe("ORBIT");
    expect(typedName("ORBITAL_SPEED")).toBe("ORBIT.ORBITAL_SPEED");
    expect(storedName("ORBITAL_SPEED")).toBe("_xldudf_ORBIT_ORBITAL_SPEED");
  });
});

describe("stepping over quoted and bracketed text", () => {
  it("ends a string literal at its closing quote, not at a doubled one (§18.17.2.1)", () => {
    const f = '"a""b"&1';
    expect(skipQuoted(f, 0)).toBe(6);
    expect(skipQuoted("'it''s'!A1", 0)).toBe(7);
    expect(skipQuoted('"open', 0)).toBe(5);
  });

  it("ends a bracketed structured reference at its matching bracket; an apostrophe escapes the next character (MS-XLSX §2.2.2)", () => {
    expect(skipBracketed("T[[#Headers],[GM]]+1", 1)).toBe(18);
    expect(skipBracketed("T[a']b]+1", 1)).toBe(7);
  });

  it("offers the positions after a character that cannot continue a name, never inside strings, quoted sheet names or brackets", () => {
    const f = 'AB+"CD"+\'E F\'!G1*T[H I]';
    const starts: string[] = [];
    walkTokens(f, (i) => {
      starts.push(f[i]);
      return undefined;
    });
    expect(starts).toEqual(["A", "+", "!", "G", "T"]);
  });
});

describe("finding ORBIT calls", () => {
  it("reads both forms at a token start, in any letter case, with the index after the parenthesis", () => {
    expect(orbitCallAt('ORBIT.BODY_GM("Earth")', 0)).toEqual({ id: "BODY_GM", form: "typed", end: 14 });
    expect(orbitCallAt("_xldudf_orbit_body_gm (A1)", 0)).toEqual({ id: "BODY_GM", form: "stored", end: 23 });
    // A stray external-link prefix in front of the stored form (OfficeDev/office-js issue #2568).
    expect(orbitCallAt("[2]!_xldudf_ORBIT_BODY_GM(A1)", 0)?.id).toBe("BODY_GM");
    expect(orbitCallAt("ORBIT.BODY_GM", 0)).toBeUndefined();
  });

  it("lists every call with its argument count, skipping text, quoted sheet names and inner calls", () => {
    expect(orbitCalls('=ORBIT.A_B(1)+_xldudf_ORBIT_C(2, 3)+SUM(3)+"ORBIT.D(4)"')).toEqual([
      { id: "A_B", args: 1 },
      { id: "C", args: 2 },
    ]);
    expect(orbitCalls("='a, b'!A1+ORBIT.X('p, q'!A1, T[[#Headers],[c, d]])")).toEqual([{ id: "X", args: 2 }]);
    expect(orbitCalls("=XORBIT.A(1)")).toEqual([]);
    expect(orbitCalls("=SUM(A1:A3)")).toEqual([]);
    expect(callsOrbit('="ORBIT.X(1)"')).toBe(false);
    expect(callsOrbit("=1+orbit.x(1)")).toBe(true);
  });

  it("splits a call's arguments at its own commas; f() has none and f(,) two empty ones", () => {
    expect(callArguments('f(1, "a,b", {1,2;3,4}, g(5, 6))', 2).args).toEqual(["1", '"a,b"', "{1,2;3,4}", "g(5, 6)"]);
    expect(callArguments("f()", 2)).toEqual({ args: [], end: 3 });
    expect(callArguments("f(,)", 2).args).toEqual(["", ""]);
  });

  it("finds the call that is the whole formula, and only that", () => {
    expect(rootOrbitCall('=ORBIT.BODY_TABLE("gm", A1:A3, TRUE)')).toBe("BODY_TABLE");
    expect(rootOrbitCall(" _xldudf_ORBIT_BURN_SEQUENCE(B2:B5, C2:C5, 180) ")).toBe("BURN_SEQUENCE");
    expect(rootOrbitCall('=ORBIT.BODY_GM("Earth")*2')).toBeUndefined();
    expect(rootOrbitCall('=ORBIT.BODY_GM(")")+ORBIT.BODY_GM("Moon")')).toBeUndefined();
    expect(rootOrbitCall("=2*ORBIT.BODY_GM(A1)")).toBeUndefined();
  });
});
