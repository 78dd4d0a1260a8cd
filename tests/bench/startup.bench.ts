/**
 * Start-up of the command as users run it: `spanwise calc` on a one-cell workbook (one SPAN
 * call, printed as CSV) against a bare `node -e 0`, in turns A B A B ... so a drift of the
 * machine's speed affects both; the ratio is taken pair by pair and its median quoted. The
 * built command must be up to date (SPANWISE_CLI_BUILD=require: a stale build fails here
 * instead of measuring the on-the-fly compiler); the same calc compiling every module from
 * source (SPANWISE_CLI_BUILD=source, what every launch cost before the build) is shown for
 * scale. Target (issue #15): under 10 times `node -e 0`.
 *
 *   npm run build:cli && npm run bench -- startup      # STARTUP_RUNS=15 for more pairs
 */
import { spawnSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import ExcelJS from "exceljs";
import { loadAverage, median, printTable, reportTarget, type TargetResult } from "./measure";

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");
const TARGET = 10;

function wallMs(args: string[], env: NodeJS.ProcessEnv = process.env): number {
  const started = performance.now();
  const result = spawnSync(process.execPath, args, { cwd: ROOT, encoding: "utf8", env });
  const ms = performance.now() - started;
  if (result.status !== 0) throw new Error(`node ${args.join(" ")} exited ${result.status}: ${result.stderr}`);
  return ms;
}

export interface Startup {
  /** Wall ms of each `node -e 0`, each built calc, and each pair's ratio (calc over the bare node after it). */
  bare: number[];
  fast: number[];
  ratios: number[];
  /** Wall ms of the calc compiling every module from source (empty when not asked for). */
  slow: number[];
  runs: number;
}

/** The one-cell calc against `node -e 0`, `runs` pairs in turns; `sourceRuns` calcs compiled from source after them. */
export async function measureStartup(runs: number, sourceRuns: number): Promise<Startup> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-startup-"));
  try {
    const book = path.join(dir, "one-cell.xlsx");
    const workbook = new ExcelJS.Workbook();
    workbook.addWorksheet("Sheet1").getCell("A1").value = { formula: 'INDEX(SPAN.MAXMOMENT("6 8 6","udl 2.5 D"),1,1)' } as ExcelJS.CellFormulaValue;
    await workbook.xlsx.writeFile(book);
    const calc = [BIN, "calc", book, "--csv", "Sheet1"];
    const built = { ...process.env, SPANWISE_CLI_BUILD: "require" };
    const source = { ...process.env, SPANWISE_CLI_BUILD: "source" };
    wallMs(["-e", "0"]);
    wallMs(calc, built);
    const out: Startup = { bare: [], fast: [], ratios: [], slow: [], runs };
    for (let i = 0; i < runs; i++) {
      const a = wallMs(calc, built);
      const b = wallMs(["-e", "0"]);
      out.fast.push(a);
      out.bare.push(b);
      out.ratios.push(a / b);
    }
    for (let i = 0; i < sourceRuns; i++) out.slow.push(wallMs(calc, source));
    return out;
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/** The start-up target's line from a measurement. */
export function startupTarget(m: Startup): TargetResult {
  return { target: "start-up", measured: `one-cell spanwise calc ${median(m.fast).toFixed(0)} ms vs node -e 0 ${median(m.bare).toFixed(0)} ms wall (medians, ${m.runs} pairs)`, ratio: median(m.ratios), ratioOf: "x node -e 0 (median of pairs)", limit: TARGET, below: true };
}

export async function run(): Promise<void> {
  const runs = Number(process.env.STARTUP_RUNS ?? 9);
  const { bare, fast, ratios, slow } = await measureStartup(runs, Math.min(3, runs));
  const load = loadAverage();
  printTable(
    ["command", "median wall (ms)", "min", "max", "x node -e 0 (median of pairs)"],
    [
      ["node -e 0", median(bare).toFixed(0), Math.min(...bare).toFixed(0), Math.max(...bare).toFixed(0), "1"],
      ["spanwise calc, built", median(fast).toFixed(0), Math.min(...fast).toFixed(0), Math.max(...fast).toFixed(0), median(ratios).toFixed(1)],
      ["spanwise calc, compiled from source", median(slow).toFixed(0), Math.min(...slow).toFixed(0), Math.max(...slow).toFixed(0), (median(slow) / median(bare)).toFixed(1)],
    ],
  );
  const ratio = median(ratios);
  console.log(`  one-cell calc = ${ratio.toFixed(1)} x node -e 0 (target under ${TARGET}: ${ratio < TARGET ? "met" : "NOT met"}); ${runs} pairs; load average ${load}; ${os.cpus().length} cores`);
  reportTarget(startupTarget({ bare, fast, ratios, slow, runs }));
}
