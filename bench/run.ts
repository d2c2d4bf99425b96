import { execFileSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { cpus, totalmem } from "node:os";
import { benchKepler } from "./kepler";
import { benchLambert } from "./lambert";
import { benchLifetime } from "./lifetime";
import { benchLift } from "./lift";
import { benchPasses } from "./passes";
import { benchRelative } from "./relative";
import { benchRunner } from "./runner";
import { benchSize } from "./size";

/**
 * Runs every benchmark in one process (ratios are measured within the same run, since the
 * machine is shared and noisy; each figure is a median of repetitions), prints a table, writes
 * bench/results.json and the README's Performance section.
 */
type Bench = [string, () => Promise<Record<string, number | string>>];
const benches: Bench[] = [
  ["Kepler's equation, elliptic (1M random M, e <= 0.999)", benchKepler],
  ["Worksheet adaptor (lifted columns through the built bundle)", benchLift],
  ["Lambert and transfer grid", benchLambert],
  ["Relative motion and low thrust (100,000 cases)", benchRelative],
  ["Orbital lifetime (50 x 20 table)", benchLifetime],
  ["Headless runner (10,000 rows x 5 formulas)", () => benchRunner()],
  ["Pass search (31-day window, 5 deg minimum elevation)", benchPasses],
  ["Bundle size", benchSize],
];

/**
 * Each benchmark runs in a process of its own (this script again, with --only K), so none is
 * measured in the heap and JIT state an earlier one left: the lifted columns, for one, allocate
 * hundreds of thousands of row arrays and are sensitive to what the garbage collector holds.
 */
async function main() {
  const only = process.argv.indexOf("--only");
  if (only >= 0) {
    const [, run] = benches[Number(process.argv[only + 1])];
    process.stdout.write(JSON.stringify(await run()));
    return;
  }
  const machine = `${cpus()[0]?.model ?? "unknown CPU"}, ${cpus().length} cores, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}`;
  const results: Record<string, Record<string, number | string>> = {};
  for (const [k, [name]] of benches.entries()) {
    process.stderr.write(`running: ${name}\n`);
    const out = execFileSync(process.execPath, [process.argv[1], "--only", String(k)], { encoding: "utf8", stdio: ["ignore", "pipe", "inherit"], maxBuffer: 1 << 26 });
    results[name] = JSON.parse(out) as Record<string, number | string>;
  }
  const rows: string[] = ["| Benchmark | Measure | Value |", "|---|---|---|"];
  for (const [name, r] of Object.entries(results)) for (const [k, v] of Object.entries(r)) rows.push(`| ${name} | ${k} | ${v} |`);
  const table = rows.join("\n");
  console.log(`\nMachine: ${machine}\n\n${table}\n`);
  writeFileSync("bench/results.json", JSON.stringify({ date: new Date().toISOString(), machine, results }, null, 2) + "\n");
  const readme = readFileSync("README.md", "utf8");
  const start = "<!-- bench:start -->";
  const end = "<!-- bench:end -->";
  if (readme.includes(start) && readme.includes(end)) {
    const section = `${start}\nMeasured by \`npm run bench\` on ${new Date().toISOString().slice(0, 10)}: ${machine}.\n\n${table}\n${end}`;
    writeFileSync("README.md", readme.slice(0, readme.indexOf(start)) + section + readme.slice(readme.indexOf(end) + end.length));
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
