/**
 * `spanwise calc` on member schedules of 10k, 100k and 200k rows (a span, a load text and
 * four SPAN formulas per row, one of them a 1 x 3 dynamic-array spill): rows per second and
 * peak memory (resident set, sampled) of a child process running the real command.
 */
import { spawn } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import ExcelJS from "exceljs";
import { storeAsDynamicArrays } from "../../src/cli/dynamicArrays";
import { printTable } from "./measure";

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");

function runCalc(input: string, out: string): Promise<{ seconds: number; peakMb: number; status: number | null; stderr: string }> {
  return new Promise((resolve) => {
    const started = performance.now();
    const child = spawn(process.execPath, ["--max-old-space-size=4096", BIN, "calc", input, "--out", out, "--force"], { cwd: ROOT });
    let peak = 0;
    let stderr = "";
    child.stderr.on("data", (d: Buffer) => (stderr = (stderr + d.toString()).slice(-2000)));
    const timer = setInterval(() => {
      try {
        const status = fs.readFileSync(`/proc/${child.pid}/status`, "utf8");
        const hwm = /VmHWM:\s+(\d+) kB/.exec(status);
        if (hwm) peak = Math.max(peak, Number(hwm[1]) / 1024);
      } catch {
        // finished
      }
    }, 200);
    child.on("exit", (status) => {
      clearInterval(timer);
      resolve({ seconds: (performance.now() - started) / 1000, peakMb: peak, status, stderr });
    });
  });
}

export async function run(): Promise<void> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-bench-"));
  const sizes = (process.env.WORKBOOK_ROWS ?? "10000,100000,200000").split(",").map(Number);
  const table: (string | number)[][] = [];
  try {
    for (const rows of sizes) {
      const file = path.join(dir, `schedule-${rows}.xlsx`);
      const plain = file.replace(/\.xlsx$/, ".plain.xlsx");
      await buildPlain(rows, plain);
      fs.writeFileSync(file, await storeAsDynamicArrays(fs.readFileSync(plain)));
      const result = await runCalc(file, path.join(dir, `out-${rows}.xlsx`));
      if (result.status !== 0) throw new Error(`calc exited ${result.status} on ${rows} rows: ${result.stderr}`);
      // The machine is shared: the load average beside each run says how far its wall time is stretched.
      const load = os.loadavg()[0].toFixed(1);
      table.push([rows, result.seconds.toFixed(1), Math.round(rows / result.seconds), Math.round(result.peakMb), load]);
      console.log(`  ${rows} rows: ${result.seconds.toFixed(1)} s, peak ${Math.round(result.peakMb)} MB, load average ${load}`);
    }
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
  printTable(["rows", "seconds", "rows/s", "peak RSS (MB)", "load (1 min)"], table);
}

async function buildPlain(rows: number, file: string): Promise<void> {
  const stream = new ExcelJS.stream.xlsx.WorkbookWriter({ filename: file, useSharedStrings: false, useStyles: false });
  const sheet = stream.addWorksheet("Schedule");
  sheet.addRow(["Span (m)", "Loads", "M max", "x at M max", "Reaction max", "M at quarters"]).commit();
  for (let i = 0; i < rows; i++) {
    const r = i + 2;
    sheet
      .addRow([
        4 + (i % 17) * 0.25,
        `udl ${1 + (i % 5)} D; point ${2 + (i % 7)} at ${1 + (i % 3) * 0.5} L`,
        { formula: `INDEX(_xldudf_SPAN_MAXMOMENT(A${r},B${r}),1,1)` },
        { formula: `INDEX(_xldudf_SPAN_MAXMOMENT(A${r},B${r}),1,2)` },
        { formula: `MAX(_xldudf_SPAN_REACTIONS(A${r},B${r}))` },
        { formula: `_xldudf_SPAN_MOMENT(A${r},B${r},A${r}*{0.25,0.5,0.75})` },
      ])
      .commit();
  }
  sheet.commit();
  await stream.commit();
}
