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
import { printTable } from "./measure";

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

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

export async function run(): Promise<void> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-startup-"));
  try {
    const book = path.join(dir, "one-cell.xlsx");
    const workbook = new ExcelJS.Workbook();
    workbook.addWorksheet("Sheet1").getCell("A1").value = { formula: 'INDEX(SPAN.MAXMOMENT("6 8 6","udl 2.5 D"),1,1)' } as ExcelJS.CellFormulaValue;
    await workbook.xlsx.writeFile(book);
    const calc = [BIN, "calc", book, "--csv", "Sheet1"];
    const built = { ...process.env, SPANWISE_CLI_BUILD: "require" };
    const source = { ...process.env, SPANWISE_CLI_BUILD: "source" };
    const runs = Number(process.env.STARTUP_RUNS ?? 9);
    wallMs(["-e", "0"]);
    wallMs(calc, built);
    const bare: number[] = [];
    const fast: number[] = [];
    const ratios: number[] = [];
    for (let i = 0; i < runs; i++) {
      const a = wallMs(calc, built);
      const b = wallMs(["-e", "0"]);
      fast.push(a);
      bare.push(b);
      ratios.push(a / b);
    }
    const slow: number[] = [];
    for (let i = 0; i < Math.min(3, runs); i++) slow.push(wallMs(calc, source));
    const load = os.loadavg().map((v) => v.toFixed(2)).join(" ");
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
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
