import { existsSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { DetailedCellError, type RawCellContent } from "hyperformula";
import { version } from "../../package.json";
import { parseCell, quoteSheet } from "../formula/cells";
import { runDemo } from "./demo";
import { filledSize, parsingError } from "./engine";
import { formatCsv, formatReport, formatReportCsv, formatReportJson, formatTable, formatValue, jsonValue, OUTPUT_FORMATS, type OutputFormat } from "./format";
import { findFunction, helpLines, listLines, similarIds } from "./help";
import { loadBundle, type LoadedBundle } from "./host";
import { toEngineFormula } from "./names";
import { progressBar } from "./progress";
import { parseProblem, recalcData, recalcFile } from "./recalc";
import { tableIndex } from "./tables";
import { readWorkbook, WorkbookError, type WorkbookData } from "./workbook";

/**
 * `orbit-cells`: recalculates ORBIT workbooks without Excel. Exit codes (also in USAGE and the
 * README): 0 done; 1 an ORBIT cell (recalc) or the formula's result (eval) is an error; 2 the
 * command could not run (usage, a missing, unreadable or unwritable file, a workbook with no
 * formulas, a formula the runner cannot read, no build).
 */

export interface Io {
  stdout: { write(s: string): unknown; isTTY?: boolean; columns?: number };
  stderr: { write(s: string): unknown; isTTY?: boolean; columns?: number };
}

const USAGE = `orbit-cells ${version}: recalculate Orbit Cells workbooks without Excel

  orbit-cells recalc <in.xlsx> [-o <out.xlsx>] [--allow-errors] [--format text|json|csv]
      Recalculate every sheet and print what was computed, which cells are errors (with their
      messages) and which formulas the runner cannot compute (kept as saved; Excel must
      recalculate them). With -o, write the workbook there with the new results cached, so it
      opens with numbers where the add-in is absent. Exit code 1 when any ORBIT cell is an error
      or cannot be computed, unless --allow-errors.
  orbit-cells eval [--in <book.xlsx>] [--set <cell>=<value> ...] [--format text|json|csv] "<formula>"
      Evaluate one formula and print its value, its spilled table, or its error and message:
        orbit-cells eval '=ORBIT.ORBITAL_SPEED("Earth", 6898)'
        orbit-cells eval --set A1=6898 '=ORBIT.ORBITAL_SPEED("Earth", A1)'
        orbit-cells eval --in budget.xlsx '=ORBIT.TRANSFER_DV("Earth", Inputs!B2, Inputs!B3)'
      References without a sheet mean the first sheet of --in (or Sheet1). --set puts a number,
      TRUE/FALSE, text or a formula (=...) into a cell first, e.g. --set "Inputs!B2=520".
  orbit-cells list
      Every function, one line each.
  orbit-cells help <FUNCTION>
      A function's parameters (with their units), description and worked example.
  orbit-cells demo [--out <folder>]
      Write the Skerry demo workbooks (an invented mission; the same sheets as the pane's
      templates) into ./examples (or <folder>), recalculate them and print the key results.
  orbit-cells --version

Exit codes: 0 done; 1 an error in an ORBIT cell (recalc) or in the result (eval); 2 the command
could not run (usage, a missing, unreadable or unwritable file, a workbook with no formulas, a
formula the runner cannot read, the functions bundle not built).

Results are preliminary two-body and first-order analyses, not for flight operations.
`;

class UsageError extends Error {}

/** The folder holding the built functions bundle (dist/functions.js and functions.json). */
export function findDist(): string | undefined {
  const env = process.env.ORBIT_CELLS_DIST;
  if (env) return existsSync(join(env, "functions.js")) ? resolve(env) : undefined;
  for (let dir = __dirname; ; dir = dirname(dir)) {
    for (const d of [dir, join(dir, "dist")]) if (existsSync(join(d, "functions.js")) && existsSync(join(d, "functions.json"))) return d;
    if (dirname(dir) === dir) return undefined;
  }
}

function bundle(): LoadedBundle {
  const dist = findDist();
  if (!dist) throw new UsageError("The functions bundle is not built (dist/functions.js is missing): run `npm run build` first.");
  return loadBundle(dist);
}

interface Parsed {
  positional: string[];
  flags: Map<string, string[]>;
}

function parseArgs(args: string[], withValue: string[]): Parsed {
  const positional: string[] = [];
  const flags = new Map<string, string[]>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === "--") {
      positional.push(...args.slice(i + 1));
      break;
    }
    // A formula such as "-1" or "=..." is an argument, not an option.
    if (a.startsWith("-") && a.length > 1 && !/^-[\d.]/.test(a)) {
      const eq = a.indexOf("=");
      const name = eq > 0 && a.startsWith("--") ? a.slice(0, eq) : a;
      const inline = eq > 0 && a.startsWith("--") ? a.slice(eq + 1) : undefined;
      const values = flags.get(name) ?? [];
      if (withValue.includes(name)) {
        const v = inline ?? args[++i];
        if (v === undefined) throw new UsageError(`${name} needs a value.`);
        values.push(v);
      } else values.push("");
      flags.set(name, values);
    } else positional.push(a);
  }
  return { positional, flags };
}

function onlyFlags(p: Parsed, allowed: string[]): void {
  for (const k of p.flags.keys()) if (!allowed.includes(k)) throw new UsageError(`unknown option ${k}.`);
}

const flag = (p: Parsed, ...names: string[]): string | undefined => {
  for (const n of names) {
    const v = p.flags.get(n);
    if (v) return v[v.length - 1];
  }
  return undefined;
};

function outputFormat(p: Parsed): OutputFormat {
  const f = flag(p, "--format") ?? "text";
  if (!(OUTPUT_FORMATS as readonly string[]).includes(f)) throw new UsageError(`--format takes ${OUTPUT_FORMATS.join(", ")}; got "${f}".`);
  return f as OutputFormat;
}

async function recalcCommand(args: string[], io: Io): Promise<number> {
  const p = parseArgs(args, ["-o", "--out", "--format"]);
  onlyFlags(p, ["-o", "--out", "--allow-errors", "--format"]);
  const format = outputFormat(p);
  if (p.positional.length !== 1) throw new UsageError("recalc takes one workbook: orbit-cells recalc <in.xlsx> [-o <out.xlsx>]");
  const out = flag(p, "-o", "--out");
  const b = bundle();
  const bar = progressBar(io.stderr);
  let done;
  try {
    done = await recalcFile(b, p.positional[0], { outPath: out, onProgress: bar.update, requireFormulas: true });
  } finally {
    bar.done();
  }
  const r = done.report;
  if (format === "json") io.stdout.write(formatReportJson(r, out ?? null) + "\n");
  else if (format === "csv") io.stdout.write(formatReportCsv(r) + "\r\n");
  else {
    io.stdout.write(formatReport(r) + "\n");
    if (out) io.stdout.write(`Wrote ${out}.\n`);
  }
  if ((r.orbitErrors.length > 0 || r.keptOrbitFormulas > 0) && !p.flags.has("--allow-errors")) return 1;
  return 0;
}

/** A --set value: a formula (=...), a number as Excel writes one, TRUE/FALSE, "quoted" or plain text. */
function inputValue(text: string, formula: (f: string) => string): RawCellContent {
  if (text.startsWith("=")) return formula(text);
  if (/^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/.test(text.trim())) return Number(text);
  if (/^(true|false)$/i.test(text.trim())) return text.trim().toUpperCase() === "TRUE";
  const quoted = /^"(.*)"$/s.exec(text);
  return `'${quoted ? quoted[1].replace(/""/g, '"') : text}`;
}

/** Puts one --set into the workbook data (adding a sheet when there is no --in workbook). */
function applySet(data: WorkbookData, spec: string, fromFile: boolean): void {
  const eq = spec.indexOf("=");
  if (eq <= 0) throw new UsageError(`--set takes <cell>=<value>, e.g. --set A1=6898; got "${spec}".`);
  const target = spec.slice(0, eq).trim();
  const m = /^(?:'((?:[^']|'')+)'|([^!]+))!(.+)$/.exec(target);
  const sheetName = m ? (m[1] !== undefined ? m[1].replace(/''/g, "'") : m[2]) : data.sheets[0].name;
  const at = parseCell(m ? m[3] : target);
  if (!at) throw new UsageError(`--set: "${m ? m[3] : target}" is not a cell address (e.g. B2).`);
  let sheet = data.sheets.find((s) => s.name.toLowerCase() === sheetName.toLowerCase());
  if (!sheet) {
    if (fromFile) throw new UsageError(`--set: ${data.path} has no sheet named "${sheetName}" (it has ${data.sheets.map((s) => `"${s.name}"`).join(", ")}).`);
    sheet = { name: sheetName, grid: [], formulas: [] };
    data.sheets.push(sheet);
  }
  const tables = tableIndex(data.tables);
  const value = inputValue(spec.slice(eq + 1), (f) => toEngineFormula(f, { tables, sheet: sheet!.name, row: at.row, col: at.col, dynamic: true }));
  const grid = sheet.grid;
  const width = Math.max(grid[0]?.length ?? 0, at.col + 1);
  while (grid.length <= at.row) grid.push([]);
  for (const row of grid) while (row.length < width) row.push(null);
  grid[at.row][at.col] = value;
  const k = sheet.formulas.findIndex((f) => f.row === at.row && f.col === at.col);
  if (k >= 0) sheet.formulas.splice(k, 1);
}

/** A sheet name the workbook does not use, for the evaluated formula's own sheet. */
function freeSheetName(data: WorkbookData): string {
  const taken = new Set(data.sheets.map((s) => s.name.toLowerCase()));
  let name = "orbit-cells eval";
  for (let n = 2; taken.has(name); n++) name = `orbit-cells eval ${n}`;
  return name;
}

async function evalCommand(args: string[], io: Io): Promise<number> {
  const p = parseArgs(args, ["--in", "--set", "--format"]);
  onlyFlags(p, ["--in", "--set", "--format"]);
  const format = outputFormat(p);
  if (p.positional.length !== 1) throw new UsageError('eval takes one formula in quotes: orbit-cells eval \'=ORBIT.ORBITAL_SPEED("Earth", 6898)\'');
  const formula = p.positional[0].trim();
  const b = bundle();
  const inPath = flag(p, "--in");
  const data: WorkbookData = inPath ? await readWorkbook(inPath) : { path: "", sheets: [{ name: "Sheet1", grid: [], formulas: [] }], names: [], tables: [] };
  for (const s of p.flags.get("--set") ?? []) applySet(data, s, inPath !== undefined);
  const name = freeSheetName(data);
  const problems: string[] = [];
  const engineFormula = toEngineFormula(formula, { tables: tableIndex(data.tables), qualifyWith: quoteSheet(data.sheets[0].name), dynamic: true, sheet: name, row: 0, col: 0, problems });
  const done = recalcData(b, data, undefined, { name, grid: [[engineFormula]] });
  const hf = done.engine.hf;
  const a = { sheet: hf.getSheetId(name)!, row: 0, col: 0 };
  const v = hf.getCellValue(a);
  const unreadable = formatValue(v) === "#ERROR!" ? parsingError(engineFormula) : undefined;
  if (unreadable !== undefined) throw new UsageError(`the runner cannot read this formula: ${parseProblem(unreadable)}.`);
  const size = filledSize(done.engine, a);
  const grid = size.rows * size.cols > 1 ? hf.getRangeValues({ start: a, end: { sheet: a.sheet, row: size.rows - 1, col: size.cols - 1 } }) : [[v]];
  const errors = grid.flat().filter((c) => c instanceof DetailedCellError);
  if (format === "json") io.stdout.write(JSON.stringify({ formula, rows: size.rows, cols: size.cols, values: grid.map((r) => r.map(jsonValue)) }, null, 2) + "\n");
  else if (format === "csv") io.stdout.write(formatCsv(grid) + "\r\n");
  else if (size.rows * size.cols > 1) {
    io.stdout.write(formatTable(grid) + "\n");
    for (const e of errors.slice(0, 10)) io.stdout.write(errorLine(e, problems) + "\n");
  } else io.stdout.write((errors.length > 0 ? errorLine(v, problems) : formatValue(v)) + "\n");
  return errors.length > 0 ? 1 : 0;
}

/** An error value and its message (or why a reference could not be resolved). */
function errorLine(e: unknown, problems: readonly string[]): string {
  const j = jsonValue(e) as { error: string; message?: string };
  const message = j.message ?? (problems.length > 0 ? problems.join("; ") : "");
  return message ? `${j.error} ${message}` : j.error;
}

function listCommand(args: string[], io: Io): number {
  const p = parseArgs(args, []);
  onlyFlags(p, []);
  if (p.positional.length > 0) throw new UsageError("list takes nothing; for one function: orbit-cells help <FUNCTION>");
  io.stdout.write(listLines(bundle()).join("\n") + "\n");
  return 0;
}

const COMMANDS = ["recalc", "eval", "list", "help", "demo"];

function helpCommand(args: string[], io: Io): number {
  const p = parseArgs(args, []);
  onlyFlags(p, []);
  if (p.positional.length === 0 || COMMANDS.includes(p.positional[0])) {
    io.stdout.write(USAGE);
    return 0;
  }
  if (p.positional.length > 1) throw new UsageError("help takes one function: orbit-cells help ORBITAL_SPEED");
  const b = bundle();
  const m = findFunction(b, p.positional[0]);
  if (!m) {
    const near = similarIds(b, p.positional[0]);
    throw new UsageError(`there is no function ${p.positional[0]}${near.length ? ` (similar: ${near.join(", ")})` : ""}; orbit-cells list shows them all.`);
  }
  const lines = helpLines(b, m);
  const example = b.exampleOf?.(m.id);
  if (example) {
    // The example evaluated, so the page shows what the call returns.
    const sheet = "help";
    const done = recalcData(b, { path: "", sheets: [], names: [], tables: [] }, undefined, { name: sheet, grid: [[toEngineFormula(example, { dynamic: true })]] });
    const a = { sheet: done.engine.hf.getSheetId(sheet)!, row: 0, col: 0 };
    const size = filledSize(done.engine, a);
    const grid = done.engine.hf.getRangeValues({ start: a, end: { sheet: a.sheet, row: size.rows - 1, col: size.cols - 1 } });
    lines.push(size.rows * size.cols > 1 ? formatTable(grid, "    ") : `  = ${formatValue(grid[0][0])}`);
  }
  io.stdout.write(lines.join("\n") + "\n");
  return 0;
}

async function demoCommand(args: string[], io: Io): Promise<number> {
  const p = parseArgs(args, ["--out"]);
  onlyFlags(p, ["--out"]);
  if (p.positional.length > 0) throw new UsageError("demo takes no workbook: orbit-cells demo [--out <folder>]");
  const folder = resolve(flag(p, "--out") ?? "examples");
  return runDemo(bundle(), folder, io);
}

/** Runs the CLI with `args` (without node and the script); returns the exit code. */
export async function runCli(args: string[], io: Io): Promise<number> {
  const [command, ...rest] = args;
  try {
    switch (command) {
      case "recalc":
        return await recalcCommand(rest, io);
      case "eval":
        return await evalCommand(rest, io);
      case "list":
        return listCommand(rest, io);
      case "demo":
        return await demoCommand(rest, io);
      case "help":
        return helpCommand(rest, io);
      case "-h":
      case "--help":
        io.stdout.write(USAGE);
        return 0;
      case "-V":
      case "--version":
      case "version":
        io.stdout.write(`orbit-cells ${version}\n`);
        return 0;
      case undefined:
        io.stdout.write(USAGE);
        return 2;
      default:
        throw new UsageError(`unknown command "${command}".`);
    }
  } catch (e) {
    if (e instanceof WorkbookError) {
      io.stderr.write(`orbit-cells: ${e.message}\n`);
      return 2;
    }
    if (e instanceof UsageError) {
      io.stderr.write(`orbit-cells: ${e.message}\nRun orbit-cells help for the commands.\n`);
      return 2;
    }
    throw e;
  }
}

/**
 * Entry point of bin/orbit-cells.js: runs with the process's arguments and sets its exit code.
 * Output to a closed pipe (`orbit-cells list | head -1`) stops quietly: the rest of the command
 * still runs (a workbook being written is finished), only its printing is dropped.
 */
export function main(): void {
  let closed = false;
  process.stdout.on("error", (e: NodeJS.ErrnoException) => {
    if (e.code === "EPIPE") closed = true;
    else throw e;
  });
  const stdout = {
    isTTY: process.stdout.isTTY,
    columns: process.stdout.columns,
    write: (s: string) => (closed ? true : process.stdout.write(s)),
  };
  runCli(process.argv.slice(2), { stdout, stderr: process.stderr }).then(
    (code) => (process.exitCode = code),
    (e) => {
      const detail = process.env.ORBIT_CELLS_DEBUG ? (e instanceof Error ? (e.stack ?? e.message) : String(e)) : e instanceof Error ? e.message : String(e);
      process.stderr.write(`orbit-cells: unexpected failure: ${detail}\n(set ORBIT_CELLS_DEBUG=1 for the stack trace)\n`);
      process.exitCode = 2;
    },
  );
}
