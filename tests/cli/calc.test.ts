/**
 * The command-line calculator on the demo workbook: every SPAN cell of the output equals a
 * direct call of the worksheet function on the cells it references; bad files give a clear
 * error, a non-zero exit and leave the input untouched.
 */
import { execFileSync, spawnSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import ExcelJS from "exceljs";
import JSZip from "jszip";
import * as sheetFunctions from "../../functions/functions";
import { SPAN_FUNCTIONS, normalizeFormula } from "../../src/engine";
import { direct } from "../engine/support/direct";
import type { CellResult } from "../../src/engine";

const ROOT = path.resolve(__dirname, "..", "..");
const BIN = path.join(ROOT, "src", "cli", "bin", "spanwise.js");
const DEMO = path.join(ROOT, "assets", "spanwise-demo.xlsx");

function run(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, [BIN, ...args], { cwd: ROOT, encoding: "utf8" });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Cached formula values as stored in the file: exceljs reads a cached 0 back as no result. */
const storedZeros = new Set<string>();

async function findStoredZeros(file: string): Promise<void> {
  const zip = await JSZip.loadAsync(fs.readFileSync(file));
  for (const name of Object.keys(zip.files).filter((n) => /^xl\/worksheets\/sheet\d+\.xml$/.test(n))) {
    const xml = await zip.file(name)!.async("string");
    for (const match of xml.matchAll(/<c r="([A-Z]+\d+)"[^>]*><f[^>]*>[^<]*<\/f><v>0<\/v>/g)) storedZeros.add(`${name.match(/\d+/)![0]}!${match[1]}`);
  }
}

function cellValue(sheet: ExcelJS.Worksheet, address: string): unknown {
  const cell = sheet.getCell(address);
  const value = cell.value as unknown;
  if (value && typeof value === "object" && "formula" in value) {
    const result = (value as { result?: unknown }).result;
    if (result === undefined && storedZeros.has(`${sheet.id}!${address}`)) return 0;
    return result ?? "";
  }
  if (value === null || value === undefined) return "";
  return value;
}

/** Splits call arguments at top-level commas (not inside quotes, braces or parentheses). */
function splitArguments(text: string): string[] {
  const out: string[] = [];
  let depth = 0;
  let quoted = false;
  let current = "";
  for (const ch of text) {
    if (ch === '"') quoted = !quoted;
    if (!quoted && (ch === "(" || ch === "{")) depth++;
    if (!quoted && (ch === ")" || ch === "}")) depth--;
    if (!quoted && depth === 0 && ch === ",") {
      out.push(current);
      current = "";
    } else current += ch;
  }
  out.push(current);
  return out;
}

/** A SPAN call's argument as the host would pass it, read from the calculated workbook. */
function argumentValue(sheet: ExcelJS.Worksheet, text: string, kind: "block" | "value"): unknown {
  const trimmed = text.trim();
  if (trimmed === "") return null;
  const scaled = /^\{([^}]*)\}\*(\$?[A-Z]+\$?\d+)$/.exec(trimmed);
  if (scaled) {
    const factor = Number(cellValue(sheet, scaled[2].replace(/\$/g, "")));
    return [scaled[1].split(",").map((n) => Number(n) * factor)];
  }
  const divided = /^(\$?[A-Z]+\$?\d+)\/(\d+(?:\.\d+)?)$/.exec(trimmed);
  if (divided) return [[Number(cellValue(sheet, divided[1].replace(/\$/g, ""))) / Number(divided[2])]];
  if (/^".*"$/.test(trimmed)) return kind === "block" ? [[trimmed.slice(1, -1)]] : trimmed.slice(1, -1);
  if (/^-?\d+(\.\d+)?$/.test(trimmed)) return kind === "block" ? [[Number(trimmed)]] : Number(trimmed);
  const [from, to = from] = trimmed.replace(/\$/g, "").split(":");
  const a = sheet.getCell(from);
  const b = sheet.getCell(to);
  const rows: unknown[][] = [];
  for (let r = Number(a.row); r <= Number(b.row); r++) {
    const row: unknown[] = [];
    for (let c = Number(a.col); c <= Number(b.col); c++) row.push(cellValue(sheet, sheet.getCell(r, c).address));
    rows.push(row);
  }
  return kind === "block" ? rows : rows[0][0];
}

/** The direct call behind a formula's SPAN call. */
function directCall(sheet: ExcelJS.Worksheet, name: string, argText: string): CellResult[][] {
  const entry = SPAN_FUNCTIONS.find((e) => e.sheetName === `SPAN.${name}`)!;
  const args = splitArguments(argText).map((text, i) => argumentValue(sheet, text, entry.arguments[i].kind));
  return direct(() => (sheetFunctions as Record<string, (...a: unknown[]) => unknown[][]>)[entry.exportName](...args));
}

describe("spanwise calc", () => {
  let dir: string;
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-calc-"));
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it("writes every SPAN cell of the demo workbook equal to a direct call", async () => {
    const input = path.join(dir, "demo.xlsx");
    fs.copyFileSync(DEMO, input);
    const before = fs.readFileSync(input);
    const out = path.join(dir, "demo-out.xlsx");
    const result = run(["calc", input, "--out", out]);
    expect(result.stderr).toContain(`wrote ${out}`);
    expect(result.status).toBe(0);
    expect(fs.readFileSync(input).equals(before)).toBe(true);

    const book = new ExcelJS.Workbook();
    await book.xlsx.readFile(out);
    await findStoredZeros(out);
    let checked = 0;
    let spanCells = 0;
    for (const sheet of book.worksheets) {
      sheet.eachRow((row) =>
        row.eachCell((cell) => {
          if (cell.type !== ExcelJS.ValueType.Formula) return;
          const formula = normalizeFormula(`=${cell.formula}`);
          if (!formula.includes("SPAN.")) return;
          spanCells++;
          const actualHere = cellValue(sheet, cell.address);
          const whole = /^=SPAN\.([A-Z]+)\((.*)\)$/.exec(formula);
          const picked = /^=(1000\*)?INDEX\(SPAN\.([A-Z]+)\((.*)\),(\d+),(\d+)\)$/.exec(formula);
          const column = /^=MAX\(SPAN\.([A-Z]+)\((.*)\)\*\{0,1,0\}\)$/.exec(formula);
          const scaled = /^=1000\*SPAN\.([A-Z]+)\((.*)\)$/.exec(formula);
          if (picked) {
            const value = directCall(sheet, picked[2], picked[3])[Number(picked[4]) - 1][Number(picked[5]) - 1] as number;
            expect(actualHere).toEqual(picked[1] ? 1000 * value : value);
          } else if (column) {
            const rows = directCall(sheet, column[1], column[2]) as number[][];
            expect(actualHere).toEqual(Math.max(0, ...rows.map((row) => row[1])));
          } else if (scaled) {
            expect(actualHere).toEqual(1000 * (directCall(sheet, scaled[1], scaled[2])[0][0] as number));
          } else if (whole) {
            const expected = directCall(sheet, whole[1], whole[2]);
            const model = cell.value as { ref?: string };
            const top = Number(cell.row);
            const left = Number(cell.col);
            expected.forEach((line, r) =>
              line.forEach((value, c) => {
                const actual = cellValue(sheet, sheet.getCell(top + r, left + c).address);
                if (typeof value === "object" && value !== null) expect(actual).toEqual({ error: value.error });
                else expect(actual).toEqual(value);
              }),
            );
            if (expected.length > 1 || expected[0].length > 1) {
              expect(model.ref).toBe(`${cell.address}:${sheet.getCell(top + expected.length - 1, left + expected[0].length - 1).address}`);
            }
          } else return;
          checked++;
        }),
      );
    }
    expect(checked).toBe(spanCells);
    expect(checked).toBeGreaterThanOrEqual(60);
  });

  it("prints a sheet as CSV and refuses to write over the input", () => {
    const input = path.join(dir, "demo-csv.xlsx");
    fs.copyFileSync(DEMO, input);
    const result = run(["calc", input, "--csv", "Study"]);
    expect(result.status).toBe(0);
    expect(result.stdout.split("\n")[4]).toMatch(/^Span \(m\),/);
    const same = run(["calc", input, "--out", input]);
    expect(same.status).not.toBe(0);
    expect(same.stderr).toContain("never writes over its input");
  });

  it("rejects a corrupted workbook with a clear message, leaving it untouched", () => {
    const input = path.join(dir, "broken.xlsx");
    const bytes = fs.readFileSync(DEMO).subarray(0, 2000);
    fs.writeFileSync(input, bytes);
    const result = run(["calc", input]);
    expect(result.status).toBe(3);
    expect(result.stderr).toMatch(/^spanwise: cannot read .*broken\.xlsx: it is not a readable \.xlsx workbook/);
    expect(fs.readFileSync(input).equals(bytes)).toBe(true);
    expect(fs.existsSync(path.join(dir, "broken.calculated.xlsx"))).toBe(false);
  });

  it("reports a missing file and a missing argument", () => {
    const missing = run(["calc", path.join(dir, "nothing.xlsx")]);
    expect(missing.status).toBe(3);
    expect(missing.stderr).toContain("no such file");
    expect(run(["calc"]).status).toBe(2);
  });

  it("is reachable as npx spanwise", () => {
    const help = execFileSync("npx", ["--no-install", "spanwise", "help"], { cwd: ROOT, encoding: "utf8" });
    expect(help).toContain("spanwise calc <book.xlsx>");
  });
});
