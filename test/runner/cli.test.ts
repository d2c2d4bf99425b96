import { spawnSync } from "node:child_process";
import { existsSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { progressBar } from "../../src/runner/progress";
import { CellError } from "../../src/runner/host";
import { direct, readBook, ROOT, tempDir, writeBook } from "./support";

// The command line, run as a user runs it (node bin/orbit-cells.js, output piped, so not a
// terminal): exit codes 0 done, 1 error cells, 2 could not run; plain messages for bad files.

function cli(...args: string[]) {
  const r = spawnSync(process.execPath, [join(ROOT, "bin", "orbit-cells.js"), ...args], { cwd: ROOT, encoding: "utf8", env: { ...process.env, FORCE_COLOR: "0" } });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe("orbit-cells eval", () => {
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

describe("the command line's other answers", () => {
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
