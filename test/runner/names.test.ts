import { describe, expect, it } from "vitest";
import { toEngineFormula, toStoredFormula } from "../../src/runner/names";
import { tableIndex, type TableInfo } from "../../src/runner/tables";

// Formula text between the file (or the user) and the engine. Grammar: ECMA-376 Part 1, §18.17.2
// Syntax, §18.17.2.1 Constants (numerical-constant with exponent-part "e" or "E", a leading or
// trailing full stop; string-constant with doubled quotes), §18.17.2.3 Cell References; MS-XLSX
// §2.2.2 Formulas for what Excel adds (structure-reference, the _xlfn. future-function prefix,
// _xlfn.SINGLE for the @ operator). Stored ORBIT names: see test/formula/scan.test.ts.

describe("ORBIT names and prefixes", () => {
  it("turns the stored form into the typed form, in any letter case", () => {
    expect(toEngineFormula('_xldudf_ORBIT_ORBITAL_SPEED("Earth",A1)')).toBe('=ORBIT.ORBITAL_SPEED("Earth",A1)');
    expect(toEngineFormula('=_xldudf_orbit_orbital_speed("Earth",A1)')).toBe('=ORBIT.ORBITAL_SPEED("Earth",A1)');
    expect(toEngineFormula('=orbit.orbital_speed("Earth",A1)')).toBe('=ORBIT.ORBITAL_SPEED("Earth",A1)');
  });

  it("drops a stray external-link prefix [n]! in front of the stored form (OfficeDev/office-js issue #2568)", () => {
    expect(toEngineFormula("[2]!_xldudf_ORBIT_BODY_GM(A1)*2")).toBe("=ORBIT.BODY_GM(A1)*2");
  });

  it("keeps typed names, and rewrites every call in a nested formula", () => {
    expect(toEngineFormula("=ORBIT.ORBITAL_SPEED(A1, _xldudf_ORBIT_ALTITUDE_TO_RADIUS(A1, 690))")).toBe("=ORBIT.ORBITAL_SPEED(A1, ORBIT.ALTITUDE_TO_RADIUS(A1, 690))");
  });

  it("leaves text inside string literals and quoted sheet names alone (§18.17.2.1 string-constant)", () => {
    expect(toEngineFormula('=CONCAT("_xldudf_ORBIT_X(", \'TRUE sheet\'!A1, "TRUE 1E5")')).toBe('=CONCAT("_xldudf_ORBIT_X(", \'TRUE sheet\'!A1, "TRUE 1E5")');
    expect(toEngineFormula('="say ""_xldudf_ORBIT_BODY_GM(1)"""')).toBe('="say ""_xldudf_ORBIT_BODY_GM(1)"""');
  });

  it("writes the boolean words as the engine's TRUE() and FALSE(), but not inside names or calls", () => {
    expect(toEngineFormula("=ORBIT.SHAPE_FROM_APSES(A1, B1, TRUE)")).toBe("=ORBIT.SHAPE_FROM_APSES(A1, B1, TRUE())");
    expect(toEngineFormula("=IF(false, 1, TRUE())")).toBe("=IF(FALSE(), 1, TRUE())");
    expect(toEngineFormula("=TRUEVALUE+TRUE!A1")).toBe("=TRUEVALUE+TRUE!A1");
  });

  it("drops Excel's _xlfn. and _xlws. prefixes of newer built-in functions (MS-XLSX §2.2.2)", () => {
    expect(toEngineFormula("=_xlfn._xlws.SORT(A1:A3)+_xlfn.STDEV.S(B1:B3)")).toBe("=SORT(A1:A3)+STDEV.S(B1:B3)");
  });
});

describe("numbers in every form §18.17.2.1 allows", () => {
  it.each([
    ["=1E6", "=1e6"],
    ["=3.986004418E5", "=3.986004418e5"],
    ["=1E-3+2E+3", "=1e-3+2e+3"],
    ["=.5E1", "=.5e1"],
    ["=1.E2", "=1.e2"],
    ["=.5", "=.5"],
    ["=2e5", "=2e5"],
  ])("%s reads as %s", (file, engine) => {
    expect(toEngineFormula(file)).toBe(engine);
  });

  it("leaves references and names with an E alone", () => {
    expect(toEngineFormula("=E5+A1:E5+Sheet1E5!A1+$E$5+LOG10(E1)")).toBe("=E5+A1:E5+Sheet1E5!A1+$E$5+LOG10(E1)");
  });
});

describe("the implicit intersection operator", () => {
  it("becomes SINGLE(), typed as @ or stored as _xlfn.SINGLE (MS-XLSX §2.2.2)", () => {
    expect(toEngineFormula("=@A1:A10*2")).toBe("=SINGLE(A1:A10)*2");
    expect(toEngineFormula("=_xlfn.SINGLE(A1:A10)*2")).toBe("=SINGLE(A1:A10)*2");
    expect(toEngineFormula("=@'Inputs 2'!B2:B9+@(C1:C3)")).toBe("=SINGLE('Inputs 2'!B2:B9)+SINGLE((C1:C3))");
    expect(toEngineFormula('=@_xldudf_ORBIT_BODY_TABLE("gm", A1)')).toBe('=SINGLE(ORBIT.BODY_TABLE("gm", A1))');
  });
});

describe("dynamic-array semantics and sheet qualification", () => {
  it("wraps a formula in ARRAYFORMULA() unless it is one ORBIT call", () => {
    expect(toEngineFormula('=1000*ORBIT.ORBITAL_SPEED("Earth", A1:A3)', { dynamic: true })).toBe('=ARRAYFORMULA(1000*ORBIT.ORBITAL_SPEED("Earth", A1:A3))');
    expect(toEngineFormula('=ORBIT.ORBITAL_SPEED("Earth", A1:A3)', { dynamic: true })).toBe('=ORBIT.ORBITAL_SPEED("Earth", A1:A3)');
  });

  it("qualifies every reference without a sheet, and only those", () => {
    const q = (f: string) => toEngineFormula(f, { qualifyWith: "'My inputs'" });
    expect(q("=A1+$B$2:C3+Other!D4+'x y'!E5")).toBe("='My inputs'!A1+'My inputs'!$B$2:C3+Other!D4+'x y'!E5");
    expect(q("=SUM(A:A)+SUM($2:$3)+LOG10(7)+ab12")).toBe("=SUM('My inputs'!A:A)+SUM('My inputs'!$2:$3)+LOG10(7)+'My inputs'!ab12");
    expect(q('=ORBIT.BODY_GM("A1")+1E5+mission_altitude')).toBe('=ORBIT.BODY_GM("A1")+1e5+mission_altitude');
  });
});

describe("structured references (MS-XLSX §2.2.2 structure-reference)", () => {
  // The pane's catalogue table: header in row 1, bodies in rows 2..4, on its own sheet.
  const bodies: TableInfo = { name: "OrbitBodies", sheet: "Body catalogue", row: 0, col: 0, rows: 4, cols: 3, headerRows: 1, totalsRows: 0, columns: ["Body", "GM (km³/s²)", "Mean radius (km)"], xml: "" };
  // A table with a totals row, on the formula's sheet: rows 3..7 (header 3, data 4..6, totals 7), columns B..C.
  const legs: TableInfo = { name: "Legs", sheet: "Plan", row: 2, col: 1, rows: 5, cols: 2, headerRows: 1, totalsRows: 1, columns: ["Burn", "dv"], xml: "" };
  const tables = tableIndex([bodies, legs]);
  const at = (f: string, row = 4, col = 3) => {
    const problems: string[] = [];
    return { engine: toEngineFormula(f, { tables, sheet: "Plan", row, col, problems }), problems };
  };

  it("resolves a column to its data rows, as an absolute range on the table's sheet", () => {
    expect(at("=INDEX(OrbitBodies[GM (km³/s²)],4)").engine).toBe("=INDEX('Body catalogue'!$B$2:$B$4,4)");
    expect(at("=SUM(orbitbodies[gm (KM³/S²)])").engine).toBe("=SUM('Body catalogue'!$B$2:$B$4)");
  });

  // Keywords, their two allowed pairs, column ranges and a bare table name (no sheet prefix for a
  // table on the formula's sheet); this-row references, stored ([#This Row]) and shown (@), row
  // relative so the same formula reads alike down a column; no table name: the table holding the cell.
  it.each([
    ["=ROWS(Legs[#All])", "=ROWS($B$3:$C$7)"],
    ["=ROWS(Legs[#Data])", "=ROWS($B$4:$C$6)"],
    ["=Legs[[#Headers],[dv]]", "=$C$3"],
    ["=Legs[[#Totals],[dv]]", "=$C$7"],
    ["=ROWS(Legs[[#Headers],[#Data],[dv]])", "=ROWS($C$3:$C$6)"],
    ["=ROWS(Legs[[#Data],[#Totals],[Burn]:[dv]])", "=ROWS($B$4:$C$7)"],
    ["=ROWS(Legs[])", "=ROWS($B$4:$C$6)"],
    ["=SUM(Legs)", "=SUM($B$4:$C$6)"],
    ["=Legs[[#This Row],[dv]]*2", "=$C5*2"],
    ["=Legs[@dv]*2", "=$C5*2"],
    ["=Legs[@[Burn]:[dv]]", "=$B5:$C5"],
  ])("%s at Plan!D5 reads %s", (formula, engine) => {
    expect(at(formula).engine).toBe(engine);
  });

  it("resolves a reference without a table name inside the table that holds the formula", () => {
    expect(at("=[@dv]*2", 4, 1).engine).toBe("=$C5*2");
  });

  it("gives #VALUE! for a this-row reference off the data rows, #REF! for a missing table, column or row kind, with the reason", () => {
    expect(at("=Legs[@dv]", 0)).toEqual({ engine: "=#VALUE!", problems: ["Legs[...]: the formula's row 1 is not a data row of table Legs"] });
    expect(at("=Legs[Mass]").problems).toEqual(['table Legs has no column named "Mass"']);
    expect(at("=OrbitBodies[#Totals]")).toEqual({ engine: "=#REF!", problems: ["OrbitBodies[...]: table OrbitBodies has no totals row"] });
    expect(at("=Nope[GM]")).toEqual({ engine: "=#REF!", problems: ["Nope[GM]: the workbook has no table named Nope"] });
    expect(at("=[@dv]", 0, 9).problems).toEqual(["[@dv]: a reference without a table name must sit inside a table"]);
  });

  it("escapes ' [ ] # inside column names with an apostrophe (escape-column-character)", () => {
    const odd: TableInfo = { ...legs, name: "Odd", columns: ["Rate [m/s]", "#1", "Bob's"] , cols: 3 };
    const t = tableIndex([odd]);
    const f = (s: string) => toEngineFormula(s, { tables: t, sheet: "Plan", row: 4, col: 9 });
    expect(f("=Odd[[Rate '[m/s']]]")).toBe("=$B$4:$B$6");
    expect(f("=Odd['#1]")).toBe("=$C$4:$C$6");
    expect(f("=Odd[Bob''s]")).toBe("=$D$4:$D$6");
  });

  it("leaves external workbook references alone", () => {
    expect(at("=[1]Sheet1!A1+1").engine).toBe("=[1]Sheet1!A1+1");
  });
});

describe("toStoredFormula", () => {
  it("writes every ORBIT call in the stored form and keeps the rest as written", () => {
    expect(toStoredFormula('=orbit.orbital_speed("Earth", B2:B9)*1000+_xlfn.CONCAT("ORBIT.X(")')).toBe('_xldudf_ORBIT_ORBITAL_SPEED("Earth", B2:B9)*1000+_xlfn.CONCAT("ORBIT.X(")');
    expect(toStoredFormula("_xldudf_orbit_body_gm(A1)")).toBe("_xldudf_ORBIT_BODY_GM(A1)");
    expect(toStoredFormula("ORBIT.ORBITAL_SPEED(INDEX(OrbitBodies[GM],1), 3.986004418E5)")).toBe("_xldudf_ORBIT_ORBITAL_SPEED(INDEX(OrbitBodies[GM],1), 3.986004418E5)");
  });

  it("round-trips with toEngineFormula", () => {
    const typed = '=ORBIT.TRANSFER_BURNS("Earth", B17, ORBIT.ALTITUDE_TO_RADIUS("Earth", 690), , TRUE())';
    expect(toEngineFormula(toStoredFormula(typed))).toBe(typed);
  });
});
