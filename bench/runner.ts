import { resolve } from "node:path";
import { HyperFormula, type RawCellContent } from "hyperformula";
import { buildEngine, ENGINE_CONFIG } from "../src/runner/engine";
import { loadBundle } from "../src/runner/host";
import { toEngineFormula } from "../src/runner/names";
import { tableIndex, type TableInfo } from "../src/runner/tables";

/**
 * The headless runner against the engine's own arithmetic (goal: at most 1.5x, README
 * "Performance"): a 10,000-row sheet of radius and semi-major axis with five ORBIT formulas a
 * row, against the same sheet with the five written out in the engine's built-in arithmetic
 * (vis-viva with SQRT and so on), both with the runner's engine settings. The ORBIT sheet is
 * given as a saved file holds it and goes through the runner's formula rewriting every time:
 * stored names (_xldudf_ORBIT_...), Excel's capital-E constants and structured references to the
 * inputs' table (Sweep[[#This Row],[radius]]), as `orbit-cells recalc` reads them; the built-in
 * sheet gets plain references, no rewriting. Timed: rewriting, building the workbook and
 * evaluating every cell; evaluation alone (contents parsed with evaluation suspended first); and
 * recalculating after every input changes. Median of interleaved repetitions (the machine is
 * shared). Run: npm run bench (or npx tsx bench/runner.ts for this part alone).
 */
const ROWS = 10_000;
const GM = 398600.4418;
/** GM as Excel writes the constant in a saved file. */
const GM_SAVED = "3.986004418E5";

/** The inputs as a table, as the file's table part declares it: header in row 1, data in rows 2..ROWS+1. */
const SWEEP: TableInfo = { name: "Sweep", sheet: "S", row: 0, col: 0, rows: ROWS + 1, cols: 2, headerRows: 1, totalsRows: 0, columns: ["radius", "sma"], xml: "" };
const TABLES = tableIndex([SWEEP]);
const RADIUS = "Sweep[[#This Row],[radius]]";
const SMA = "Sweep[[#This Row],[sma]]";

/** The five formulas of a row (inputs in A and B, row r), ORBIT as a file stores them or built-in. */
const FORMULAS: Record<"orbit" | "earth" | "builtin", (r: number) => string[]> = {
  orbit: () => [
    `_xldudf_ORBIT_ORBITAL_SPEED(${GM_SAVED}, ${RADIUS})`,
    `_xldudf_ORBIT_ORBITAL_SPEED(${GM_SAVED}, ${RADIUS}, ${SMA})`,
    `_xldudf_ORBIT_ESCAPE_SPEED(${GM_SAVED}, ${RADIUS})`,
    `_xldudf_ORBIT_PERIOD_FROM_SMA(${GM_SAVED}, ${SMA})`,
    `_xldudf_ORBIT_SPECIFIC_ENERGY(${GM_SAVED}, ${SMA})`,
  ],
  earth: (r) => [
    `=ORBIT.ORBITAL_SPEED("Earth", A${r})`,
    `=ORBIT.ORBITAL_SPEED("Earth", A${r}, B${r})`,
    `=ORBIT.ESCAPE_SPEED("Earth", A${r})`,
    `=ORBIT.PERIOD_FROM_SMA("Earth", B${r})`,
    `=ORBIT.SPECIFIC_ENERGY("Earth", B${r})`,
  ],
  builtin: (r) => [
    `=SQRT(${GM}/A${r})`,
    `=SQRT(${GM}*(2/A${r}-1/B${r}))`,
    `=SQRT(2*${GM}/A${r})`,
    `=2*PI()*SQRT(B${r}^3/${GM})`,
    `=-${GM}/(2*B${r})`,
  ],
};

const inputs = (i: number, shift: number): [number, number] => [6600 + 0.5 * i + shift, 7000 + 0.5 * i + shift];

/** The sheet: a header row, then inputs and formulas; with `rewrite`, each formula read as the runner reads a file's formulas. */
function sheet(kind: keyof typeof FORMULAS, rewrite: boolean): RawCellContent[][] {
  const rows: RawCellContent[][] = [["radius", "sma", null, null, null, null, null]];
  for (let i = 0; i < ROWS; i++) {
    const r = i + 1;
    const formulas = FORMULAS[kind](r + 1).map((f, k) => (rewrite ? toEngineFormula(f, { tables: TABLES, sheet: "S", row: r, col: 2 + k, dynamic: true }) : f));
    rows.push([...inputs(i, 0), ...formulas]);
  }
  return rows;
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const round = (x: number, d = 2): number => Number(x.toFixed(d));

export async function benchRunner(reps = 7): Promise<Record<string, number | string>> {
  const bundle = loadBundle(resolve(process.cwd(), "dist"));
  const sheets = { orbit: sheet("orbit", true), earth: sheet("earth", false), builtin: sheet("builtin", false) };
  const build: Record<string, () => HyperFormula> = {
    // The rewriting of every formula is part of the timed work.
    orbit: () => buildEngine(bundle, { S: sheet("orbit", true) }).hf,
    earth: () => buildEngine(bundle, { S: sheets.earth }).hf,
    builtin: () => HyperFormula.buildFromSheets({ S: sheets.builtin }, ENGINE_CONFIG),
  };

  // Same numbers both ways: the ORBIT cells and the arithmetic agree to rounding.
  const a = build.orbit();
  const b = build.builtin();
  let worst = 0;
  for (let i = 1; i <= ROWS; i += 97)
    for (let c = 2; c < 7; c++) {
      const x = a.getCellValue({ sheet: 0, row: i, col: c }) as number;
      const y = b.getCellValue({ sheet: 0, row: i, col: c }) as number;
      worst = Math.max(worst, Math.abs(x - y) / Math.abs(y));
    }
  if (!(worst < 1e-12)) throw new Error(`the two sheets disagree (relative ${worst})`);

  // Parsing and evaluation apart: contents entered with evaluation suspended, then evaluated.
  const empty: Record<string, () => HyperFormula> = {
    orbit: () => buildEngine(bundle, { S: [] }).hf,
    builtin: () => HyperFormula.buildFromSheets({ S: [] }, ENGINE_CONFIG),
  };
  const times: Record<string, number[]> = { orbit: [], earth: [], builtin: [], orbitRecalc: [], builtinRecalc: [], orbitEval: [], builtinEval: [] };
  for (let r = 0; r < reps + 1; r++) {
    for (const kind of ["orbit", "builtin"] as const) {
      const hf = empty[kind]();
      hf.suspendEvaluation();
      hf.setSheetContent(0, sheets[kind]);
      const t0 = performance.now();
      hf.resumeEvaluation();
      times[`${kind}Eval`].push(performance.now() - t0);
      hf.destroy();
    }
    for (const kind of ["orbit", "earth", "builtin"] as const) {
      const t0 = performance.now();
      const hf = build[kind]();
      const t1 = performance.now();
      if (kind !== "earth") {
        // Every input changes: every formula recalculates.
        hf.batch(() => {
          for (let i = 0; i < ROWS; i++) hf.setCellContents({ sheet: 0, row: i + 1, col: 0 }, [inputs(i, r + 1)]);
        });
        times[`${kind}Recalc`].push(performance.now() - t1);
      }
      times[kind].push(t1 - t0);
      hf.destroy();
    }
  }
  for (const k of Object.keys(times)) times[k].shift(); // the warm-up
  const m = Object.fromEntries(Object.entries(times).map(([k, v]) => [k, median(v)]));
  return {
    "rows x formulas": `${ROWS.toLocaleString("en-US")} x 5`,
    "rewrite + build + evaluate, ORBIT as saved (E constants, structured references), ms": round(m.orbit, 0),
    "build + evaluate, built-in arithmetic, ms": round(m.builtin, 0),
    "rewrite + build + evaluate, ORBIT / built-in (goal <= 1.5)": round(m.orbit / m.builtin),
    "build + evaluate, ORBIT with body \"Earth\", ms": round(m.earth, 0),
    "build + evaluate, ORBIT \"Earth\" / built-in": round(m.earth / m.builtin),
    "evaluate only (parsed beforehand), ORBIT, ms": round(m.orbitEval, 0),
    "evaluate only (parsed beforehand), built-in, ms": round(m.builtinEval, 0),
    "evaluate only, ORBIT / built-in": round(m.orbitEval / m.builtinEval),
    "recalculate after every input changes, ORBIT, ms": round(m.orbitRecalc, 0),
    "recalculate after every input changes, built-in, ms": round(m.builtinRecalc, 0),
    "recalculate, ORBIT / built-in": round(m.orbitRecalc / m.builtinRecalc),
  };
}

// Run alone (npx tsx bench/runner.ts); bundled into bench/run.ts this module is not the entry.
if (process.argv[1] && /bench[\\/]runner\.ts$/.test(process.argv[1])) {
  benchRunner().then((r) => {
    for (const [k, v] of Object.entries(r)) console.log(`${k}: ${v}`);
  });
}
