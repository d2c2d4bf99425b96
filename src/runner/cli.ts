import { existsSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { DetailedCellError } from "hyperformula";
import { loadBundle, type LoadedBundle } from "./host";
import { buildEngine, addressKey } from "./engine";
import { formatReport, formatTable, formatValue } from "./format";
import { toEngineFormula } from "./names";
import { progressBar } from "./progress";
import { recalcFile } from "./recalc";
import { WorkbookError } from "./workbook";
import { runDemo } from "./demo";

/**
 * `orbit-cells`: recalculates ORBIT workbooks without Excel.
 * Exit codes: 0 done; 1 an ORBIT cell (recalc) or the formula (eval) is an error; 2 the command
 * could not run (usage, a missing or unreadable file, a workbook with no formulas, no build).
 */

export interface Io {
  stdout: { write(s: string): unknown; isTTY?: boolean; columns?: number };
  stderr: { write(s: string): unknown; isTTY?: boolean; columns?: number };
}

const USAGE = `orbit-cells: recalculate Orbit Cells workbooks without Excel

  orbit-cells recalc <in.xlsx> [-o <out.xlsx>] [--allow-errors]
      Recalculate every sheet and print what was computed and which cells are errors (with
      their messages). With -o, write the workbook there with the new results cached, so it
      opens with numbers where the add-in is absent. Exit code 1 when any ORBIT cell is an
      error (for pipelines), unless --allow-errors.
  orbit-cells eval "<formula>"
      Evaluate one formula, e.g. orbit-cells eval '=ORBIT.ORBITAL_SPEED("Earth", 6898)',
      and print its value, its spilled table, or its error and message.
  orbit-cells demo [--out <folder>]
      Write the Skerry demo workbooks (an invented mission) into examples/, recalculate them
      and print the key results.

Results are preliminary two-body and first-order analyses, not for flight operations.
`;

class UsageError extends Error {}

/** The folder holding the built functions bundle (dist/functions.js). */
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
  flags: Map<string, string | true>;
}

function parseArgs(args: string[], withValue: string[]): Parsed {
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === "--") {
      positional.push(...args.slice(i + 1));
      break;
    }
    if (a.startsWith("-") && a.length > 1 && !/^-\d/.test(a)) {
      const [name, inline] = a.split("=", 2);
      if (withValue.includes(name)) {
        const v = inline ?? args[++i];
        if (v === undefined) throw new UsageError(`${name} needs a value.`);
        flags.set(name, v);
      } else flags.set(name, true);
    } else positional.push(a);
  }
  return { positional, flags };
}

function onlyFlags(p: Parsed, allowed: string[]): void {
  for (const k of p.flags.keys()) if (!allowed.includes(k)) throw new UsageError(`unknown option ${k}.`);
}

async function recalcCommand(args: string[], io: Io): Promise<number> {
  const p = parseArgs(args, ["-o", "--out"]);
  onlyFlags(p, ["-o", "--out", "--allow-errors"]);
  if (p.positional.length !== 1) throw new UsageError("recalc takes one workbook: orbit-cells recalc <in.xlsx> [-o <out.xlsx>]");
  const out = (p.flags.get("-o") ?? p.flags.get("--out")) as string | undefined;
  const b = bundle();
  const bar = progressBar(io.stderr);
  let done;
  try {
    done = await recalcFile(b, p.positional[0], { outPath: out, onProgress: bar.update, requireFormulas: true });
  } finally {
    bar.done();
  }
  const r = done.report;
  io.stdout.write(formatReport(r) + "\n");
  if (out) io.stdout.write(`Wrote ${out}.\n`);
  if (r.orbitErrors.length > 0 && !p.flags.has("--allow-errors")) return 1;
  return 0;
}

function evalCommand(args: string[], io: Io): number {
  const p = parseArgs(args, []);
  onlyFlags(p, []);
  if (p.positional.length !== 1) throw new UsageError('eval takes one formula in quotes: orbit-cells eval \'=ORBIT.ORBITAL_SPEED("Earth", 6898)\'');
  const engine = buildEngine(bundle(), { Eval: [[toEngineFormula(p.positional[0].trim())]] });
  const a = { sheet: 0, row: 0, col: 0 };
  const v = engine.hf.getCellValue(a);
  const size = engine.spills.get(addressKey(a));
  if (size && size.rows * size.cols > 1) {
    const grid = engine.hf.getRangeValues({ start: a, end: { sheet: 0, row: size.rows - 1, col: size.cols - 1 } });
    io.stdout.write(formatTable(grid) + "\n");
    const errs = grid.flat().filter((c): c is DetailedCellError => c instanceof DetailedCellError);
    for (const e of errs.slice(0, 10)) io.stdout.write(`${e.value} ${e.message}\n`);
    return errs.length > 0 ? 1 : 0;
  }
  if (v instanceof DetailedCellError) {
    io.stdout.write(`${v.value}${v.message ? ` ${v.message}` : ""}\n`);
    return 1;
  }
  io.stdout.write(formatValue(v) + "\n");
  return 0;
}

async function demoCommand(args: string[], io: Io): Promise<number> {
  const p = parseArgs(args, ["--out"]);
  onlyFlags(p, ["--out"]);
  if (p.positional.length > 0) throw new UsageError("demo takes no workbook: orbit-cells demo [--out <folder>]");
  const dist = findDist();
  const folder = (p.flags.get("--out") as string | undefined) ?? (dist ? join(dirname(dist), "examples") : "examples");
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
        return evalCommand(rest, io);
      case "demo":
        return await demoCommand(rest, io);
      case undefined:
      case "help":
      case "-h":
      case "--help":
        io.stdout.write(USAGE);
        return command === undefined ? 2 : 0;
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

/** Entry point of bin/orbit-cells.js: runs with the process's arguments and sets its exit code. */
export function main(): void {
  runCli(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr }).then(
    (code) => (process.exitCode = code),
    (e) => {
      process.stderr.write(`orbit-cells: unexpected failure: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
      process.exitCode = 2;
    },
  );
}
