import { spawnSync } from "node:child_process";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { progressBar } from "../../src/runner/progress";
import { CellError } from "../../src/runner/host";
import { bundle, direct, readBook, ROOT, tempDir, writeBook } from "./support";
import { writeExcelLikeBook } from "./xlsx";

// The command line, run as a user runs it (node bin/orbit-cells.js, output piped, so not a
// terminal): exit codes 0 done, 1 error cells, 2 could not run; plain messages for bad files.

function cli(...args: string[]) {
  const r = spawnSync(process.execPath, [join(ROOT, "bin", "orbit-cells.js"), ...args], { cwd: ROOT, encoding: "utf8", env: { ...process.env, FORCE_COLOR: "0" } });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const version = (JSON.parse(readFileSync(join(ROOT, "package.json"), "utf8")) as { version: string }).version;

describe("orbit-cells eval", () => {
  it("reads numbers as Excel writes them, capital exponents included (ECMA-376 Part 1, §18.17.2.1)", () => {
    expect(cli("eval", "=1E6")).toMatchObject({ code: 0, out: "1000000\n" });
    expect(cli("eval", "=ORBIT.ORBITAL_SPEED(3.986004418E5, 6898)").out).toBe(`${direct("ORBITAL_SPEED", 398600.4418, 6898)[0][0]}\n`);
  });

  it("evaluates on a sheet of its own: A1 is an input cell, blank (0) unless --set gives it a value", () => {
    const blank = cli("eval", '=ORBIT.ORBITAL_SPEED("Earth", A1)');
    const zero = direct("ORBITAL_SPEED", "Earth", 0)[0][0] as CellError;
    expect(blank).toMatchObject({ code: 1, out: `#VALUE! ${zero.message}\n` });
    const set = cli("eval", "--set", "A1=6898", "--set", "Sheet1!B1=3.986004418E5", '=ORBIT.ORBITAL_SPEED(B1, A1)');
    expect(set).toMatchObject({ code: 0, out: `${direct("ORBITAL_SPEED", 398600.4418, 6898)[0][0]}\n` });
    expect(cli("eval", "--set", 'A1="Mars"', "--set", "A2==A1", "=ORBIT.BODY_GM(A2)").out).toBe(`${direct("BODY_GM", "Mars")[0][0]}\n`);
  });

  it("refers to the cells of a workbook given with --in, its tables included", async () => {
    const dir = tempDir();
    const path = writeExcelLikeBook(join(dir, "budget.xlsx"), [
      { name: "Sheet1", cells: { A1: "Altitude", B2: 690, B3: { f: "B2*2", cached: 0 } } },
      { name: "Bodies", cells: { A1: "Body", B1: "GM", A2: "Earth", B2: 398600.4418 }, tables: [{ name: "OrbitBodies", ref: "A1:B2", columns: ["Body", "GM"] }] },
    ]);
    const r690 = direct("ALTITUDE_TO_RADIUS", "Earth", 690)[0][0];
    expect(cli("eval", "--in", path, '=ORBIT.ALTITUDE_TO_RADIUS("Earth", Sheet1!B2)')).toMatchObject({ code: 0, out: `${r690}\n` });
    expect(cli("eval", "--in", path, '=ORBIT.ALTITUDE_TO_RADIUS("Earth", B3/2)').out).toBe(`${r690}\n`); // a computed cell, no sheet given: the first sheet
    expect(cli("eval", "--in", path, "--set", "B2=520", '=ORBIT.ALTITUDE_TO_RADIUS("Earth", B3/2)').out).toBe(`${direct("ALTITUDE_TO_RADIUS", "Earth", 520)[0][0]}\n`);
    expect(cli("eval", "--in", path, "=ORBIT.ORBITAL_SPEED(INDEX(OrbitBodies[GM],1), 7000)").out).toBe(`${direct("ORBITAL_SPEED", 398600.4418, 7000)[0][0]}\n`);
    expect(cli("eval", "--in", path, "=ORBIT.ORBITAL_SPEED(OrbitBodies[Mass], 7000)")).toMatchObject({ code: 1, out: '#REF! table OrbitBodies has no column named "Mass"\n' });
    expect(cli("eval", "--in", path, "--set", "Nope!A1=1", "=1").err).toMatch(/has no sheet named "Nope" \(it has "Sheet1", "Bodies"\)/);
  });

  it("prints JSON and CSV for scripts", () => {
    const returned = direct("SHAPE_FROM_APSES", 6898, 7068, true);
    const json = cli("eval", "--format", "json", "=ORBIT.SHAPE_FROM_APSES(6898, 7068, TRUE)");
    expect(JSON.parse(json.out)).toEqual({ formula: "=ORBIT.SHAPE_FROM_APSES(6898, 7068, TRUE)", rows: 2, cols: 2, values: returned });
    const e = direct("ORBITAL_SPEED", "Earth", -5)[0][0] as CellError;
    expect(JSON.parse(cli("eval", "--format=json", '=ORBIT.ORBITAL_SPEED("Earth", -5)').out).values).toEqual([[{ error: "#VALUE!", message: e.message }]]);
    const csv = cli("eval", "--format", "csv", "=ORBIT.SHAPE_FROM_APSES(6898, 7068, TRUE)");
    expect(csv.out).toBe(returned.map((r) => r.map(String).join(",")).join("\r\n") + "\r\n");
    expect(cli("eval", "--format", "xml", "=1").err).toMatch(/--format takes text, json, csv; got "xml"/);
  });

  it("says in one line when the runner cannot read a formula (exit 2)", () => {
    const r = cli("eval", "=1+");
    expect(r).toMatchObject({ code: 2, out: "" });
    expect(r.err).toMatch(/^orbit-cells: the runner cannot read this formula: it ends too early\.\n/);
    expect(cli("eval", "=A1#").err).toMatch(/cannot read this formula: it does not know the character "#"/);
  });

  it("prints a value at full double precision", () => {
    const r = cli("eval", '=ORBIT.ORBITAL_SPEED("Earth", 6898.137)');
    expect(r).toMatchObject({ code: 0, err: "" });
    expect(r.out).toBe(`${direct("ORBITAL_SPEED", "Earth", 6898.137)[0][0]}\n`);
  });

  it("prints a spilled table, and takes the stored name form too", () => {
    const r = cli("eval", "_xldudf_ORBIT_SHAPE_FROM_APSES(6898, 7068, TRUE)");
    expect(r.code).toBe(0);
    const rows = r.out.trimEnd().split("\n").map((l) => l.trim().split(/\s{2,}/));
    const returned = direct("SHAPE_FROM_APSES", 6898, 7068, true);
    expect(rows).toEqual(returned.map((row) => row.map(String)));
  });

  it("prints the error and its message, and exits 1", () => {
    const r = cli("eval", '=ORBIT.ORBITAL_SPEED("Earth", -5)');
    const e = direct("ORBITAL_SPEED", "Earth", -5)[0][0] as CellError;
    expect(r).toMatchObject({ code: 1, out: `#VALUE! ${e.message}\n` });
  });
});

describe("orbit-cells recalc", () => {
  it("says so, with exit code 2, for a missing file, a file that is not a workbook, an old .xls and a broken package", () => {
    const dir = tempDir();
    const missing = cli("recalc", join(dir, "nope.xlsx"));
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/nope\.xlsx: no such file/);

    const text = join(dir, "notes.xlsx");
    writeFileSync(text, "delta-v budget, to do\n");
    const notBook = cli("recalc", text);
    expect(notBook.code).toBe(2);
    expect(notBook.err).toMatch(/is not an \.xlsx workbook/);

    const xls = join(dir, "old.xls");
    writeFileSync(xls, Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0, 0, 0]));
    const old = cli("recalc", xls);
    expect(old.code).toBe(2);
    expect(old.err).toMatch(/old binary Excel file \(\.xls\); save it as an \.xlsx workbook/);

    const broken = join(dir, "broken.xlsx");
    writeFileSync(broken, Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.alloc(64, 7)]));
    const bad = cli("recalc", broken);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/could not be read as an \.xlsx workbook/);
    for (const r of [missing, notBook, old, bad]) expect(r.err).not.toMatch(/\n\s+at /); // no stack traces
  });

  it("says a workbook has no formulas, with exit code 2", async () => {
    const path = await writeBook(join(tempDir(), "plain.xlsx"), { Inputs: { A1: "Wet mass", B1: 180 } });
    const r = cli("recalc", path);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/plain\.xlsx has no formulas: nothing to recalculate/);
  });

  it("exits 1 when an ORBIT cell is an error, listing it by type, address and message; 0 with --allow-errors", async () => {
    const path = await writeBook(join(tempDir(), "budget.xlsx"), {
      Budget: { A1: 7000, A2: -1, B1: { formula: 'ORBIT.ORBITAL_SPEED("Earth", A1:A2)' } },
    });
    const e = direct("ORBITAL_SPEED", "Earth", -1)[0][0] as CellError;
    const r = cli("recalc", path);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/1 formula \(1 calling ORBIT functions\), 2 cells recalculated/);
    expect(r.out).toContain("Errors in ORBIT cells (1):\n  #VALUE!  1 cell\n    Budget!B2  " + e.message);
    expect(cli("recalc", path, "--allow-errors").code).toBe(0);
  });

  it("says in one line that -o cannot be written, before recalculating (exit 2)", async () => {
    const path = await writeBook(join(tempDir(), "in.xlsx"), { S: { A1: { formula: 'ORBIT.BODY_GM("Mars")' } } });
    const missing = cli("recalc", path, "-o", "/missing/dir/out.xlsx");
    expect(missing).toMatchObject({ code: 2, out: "", err: "orbit-cells: cannot write /missing/dir/out.xlsx: the folder /missing/dir does not exist.\n" });
    const folder = cli("recalc", path, "-o", tempDir());
    expect(folder.err).toMatch(/^orbit-cells: cannot write .*: it is a folder\.\n$/);
  });

  it("reports in JSON and CSV", async () => {
    const path = await writeBook(join(tempDir(), "budget.xlsx"), { Budget: { A1: 7000, A2: -1, B1: { formula: 'ORBIT.ORBITAL_SPEED("Earth", A1:A2)' }, C1: { formula: "SOMEVENDORFUNCTION(1)", result: 3 } } });
    const e = direct("ORBITAL_SPEED", "Earth", -1)[0][0] as CellError;
    const json = JSON.parse(cli("recalc", path, "--format", "json").out);
    expect(json).toMatchObject({ sheets: 1, formulas: 2, orbitFormulas: 1, orbitErrors: [{ sheet: "Budget", cell: "B2", code: "#VALUE!", message: e.message }], written: null });
    expect(json.kept).toEqual([{ sheet: "Budget", cell: "C1", code: "#NAME?", message: "Function name SOMEVENDORFUNCTION not recognized" }]);
    const text = cli("recalc", path).out;
    expect(text).toContain("Kept as saved (the runner cannot compute these formulas) (1):\n  #NAME?  1 cell\n    Budget!C1  Function name SOMEVENDORFUNCTION not recognized\n");
    expect(text).toContain("Excel must recalculate 1 cell when it opens the file: the kept ones.\n");
    const csv = cli("recalc", path, "--format", "csv");
    expect(csv.code).toBe(1);
    expect(csv.out).toBe(`list,sheet,cell,code,message\r\norbit-error,Budget,B2,#VALUE!,${e.message!.includes(",") ? `"${e.message}"` : e.message}\r\nkept,Budget,C1,#NAME?,Function name SOMEVENDORFUNCTION not recognized\r\n`);
  });

  it("writes the recalculated workbook with -o and exits 0 when all is well", async () => {
    const dir = tempDir();
    const path = await writeBook(join(dir, "in.xlsx"), { S: { A1: { formula: 'ORBIT.BODY_GM("Mars")' } } });
    const out = join(dir, "out.xlsx");
    const r = cli("recalc", path, "-o", out);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/No errors in ORBIT cells\.\nWrote .*out\.xlsx\.\n$/);
    expect(existsSync(out)).toBe(true);
    expect((await readBook(out)).getWorksheet("S")!.getCell("A1").value).toEqual({ formula: '_xldudf_ORBIT_BODY_GM("Mars")', result: direct("BODY_GM", "Mars")[0][0], shareType: "array", ref: "A1" });
  });

  it("draws no progress bar when its output is not a terminal, even for a long recalculation", async () => {
    const cells: Record<string, { formula: string } | number> = {};
    for (let r = 1; r <= 4000; r++) {
      cells[`A${r}`] = 6500 + r;
      cells[`B${r}`] = { formula: `ORBIT.ORBITAL_SPEED("Earth", A${r})` };
      cells[`C${r}`] = { formula: `ORBIT.PERIOD_FROM_SMA("Earth", A${r})` };
    }
    const path = await writeBook(join(tempDir(), "long.xlsx"), { Sweep: cells });
    const r = cli("recalc", path);
    expect(r.code).toBe(0);
    expect(r.err).toBe("");
    expect(r.out).not.toMatch(/\r|calculating|\[#/);
  });
});

describe("orbit-cells list and help", () => {
  it("lists every function of functions.json, one line each, with its parameters", () => {
    const r = cli("list");
    expect(r.code).toBe(0);
    const lines = r.out.trimEnd().split("\n");
    expect(lines.map((l) => l.split("(")[0])).toEqual(bundle().metadata.map((m) => m.id));
    expect(lines.find((l) => l.startsWith("ORBITAL_SPEED("))).toMatch(/^ORBITAL_SPEED\(body, radius, \[sma\]\) +Speed on an orbit at a given distance from the body's centre, from vis-viva: .*\.$/);
  });

  it("shows a function's parameters with their units, and its worked example evaluated", () => {
    const r = cli("help", "orbit.orbital_speed");
    expect(r.code).toBe(0);
    expect(r.out).toContain("ORBIT.ORBITAL_SPEED(body, radius, [sma])");
    expect(r.out).toMatch(/\n {2}radius +Distance from the body's centre, km\.\n/);
    expect(r.out).toMatch(/\n {2}sma +\(optional\) Semi-major axis, km/);
    const example = bundle().exampleOf!("ORBITAL_SPEED")!;
    expect(r.out).toContain(`Example:\n  ${example}\n  = ${direct("ORBITAL_SPEED", "Earth", Number(/, ([\d.]+)\)/.exec(example)![1]))[0][0]}\n`);
    const none = cli("help", "ORBITAL_SPEEDS");
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/there is no function ORBITAL_SPEEDS \(similar: .*ORBITAL_SPEED/);
  });
});

describe("the command line's other answers", () => {
  it("prints its version, and the exit codes in its help", () => {
    expect(cli("--version")).toMatchObject({ code: 0, out: `orbit-cells ${version}\n` });
    expect(cli("--help").out).toMatch(/Exit codes: 0 done; 1 an error in an ORBIT cell \(recalc\) or in the result \(eval\); 2 the command\ncould not run/);
  });

  it("says in one line that demo cannot write into its folder (exit 2)", () => {
    const file = join(tempDir(), "a-file");
    writeFileSync(file, "not a folder");
    const r = cli("demo", "--out", join(file, "demo"));
    expect(r).toMatchObject({ code: 2, out: "" });
    expect(r.err).toBe(`orbit-cells: cannot write the demo workbooks into ${join(file, "demo")}: a part of the path is a file, not a folder.\n`);
  });

  it("writes nothing more, and no error, when its output pipe closes (| head -1)", () => {
    const r = spawnSync("bash", ["-c", `set -o pipefail; "${process.execPath}" "${join(ROOT, "bin", "orbit-cells.js")}" list | head -1`], { cwd: ROOT, encoding: "utf8" });
    expect(r.status).toBe(0);
    expect(r.stderr).toBe("");
    expect(r.stdout.split("\n").filter((l) => l !== "")).toHaveLength(1);
  });

  it("prints the usage for help (0), with no command (2), and names an unknown command or option (2)", () => {
    const help = cli("help");
    expect(help.code).toBe(0);
    expect(help.out).toMatch(/orbit-cells recalc <in\.xlsx> \[-o <out\.xlsx>\] \[--allow-errors\]/);
    expect(cli().code).toBe(2);
    const unknown = cli("recalculate", "x.xlsx");
    expect(unknown).toMatchObject({ code: 2 });
    expect(unknown.err).toMatch(/unknown command "recalculate"/);
    expect(cli("recalc", "x.xlsx", "--fast").err).toMatch(/unknown option --fast/);
  });
});

describe("the progress bar", () => {
  const terminal = () => {
    const written: string[] = [];
    return { isTTY: true, columns: 80, written, write: (s: string) => written.push(s) };
  };

  it("draws on a terminal once a run is long, and clears its line when done", () => {
    const t = terminal();
    const bar = progressBar(t, 0);
    bar.update("calculating", 500, 1000);
    bar.update("calculating", 1000, 1000);
    bar.done();
    expect(t.written[0]).toMatch(/^\rcalculating +\[#+-+\] {2}50% {2}500\/1,000 ORBIT calls/);
    expect(t.written.at(-2)).toMatch(/100%/);
    expect(t.written.at(-1)).toBe("\r\x1b[K");
  });

  it("stays silent for a short run and whenever the stream is not a terminal", () => {
    const t = terminal();
    const quick = progressBar(t, 60_000);
    quick.update("calculating", 1, 2);
    quick.done();
    expect(t.written).toEqual([]);
    const piped = { ...terminal(), isTTY: false };
    const bar = progressBar(piped, 0);
    bar.update("reading", 1, 1);
    bar.done();
    expect(piped.written).toEqual([]);
  });
});
