/**
 * Parsers of cell text at the spreadsheet's cell limit (reported, never asserted in jest):
 * `node tests/bench/run.js parsers`. Each pathological text of tests/hardening/pathological.ts
 * at 32,767 characters, mean time per call; target: under 10 ms (issue 14).
 */
import { CASES } from "../hardening/pathological";
import { measure, printTable } from "./measure";

const CELL_LIMIT = 32767;
const TARGET_MS = 10;

export function run(): void {
  const rows: (string | number)[][] = [];
  let worst = 0;
  for (const [name, build, call] of CASES) {
    const text = build(CELL_LIMIT);
    const { perCallMs } = measure(() => {
      try {
        call(text);
      } catch {
        // refusals are the expected answer
      }
    }, 200);
    worst = Math.max(worst, perCallMs);
    rows.push([name, perCallMs.toFixed(3)]);
  }
  printTable(["32,767-character text", "ms per call"], rows);
  console.log(`parsers: slowest ${worst.toFixed(3)} ms per call at ${CELL_LIMIT} characters (target < ${TARGET_MS} ms)`);
}
