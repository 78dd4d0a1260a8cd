/**
 * `spanwise calc <book.xlsx> [--out <file.xlsx>] [--csv <sheet>] [--force]`: evaluates every
 * formula of a workbook, SPAN functions included, and writes the values into a new file.
 * The input is only read. The output never replaces the input, nor (without --force) any
 * existing file; it is written to a temporary name first and renamed when complete.
 */
import fs from "fs";
import path from "path";
import cliProgress from "cli-progress";
import { SpanWorkbook, isCellError, type CellResult } from "../engine";
import { readBook, storeResults } from "./xlsxBook";
import { UsageError, type Io } from "./io";

export interface CalcOptions {
  input: string;
  out?: string;
  csv?: string;
  force: boolean;
}

/** Books with at least this many SPAN calls or formulas get a progress bar. */
const PROGRESS_THRESHOLD = 300;

export function defaultOutput(input: string): string {
  const { dir, name } = path.parse(input);
  return path.join(dir, `${name}.calculated.xlsx`);
}

function sameFile(a: string, b: string): boolean {
  const real = (p: string): string => {
    try {
      return fs.realpathSync(p);
    } catch {
      return path.resolve(p);
    }
  };
  return real(a) === real(b);
}

function csvField(value: CellResult): string {
  const text = value === null ? "" : isCellError(value) ? value.error : String(value);
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(values: CellResult[][]): string {
  return values.map((row) => row.map(csvField).join(",")).join("\n") + "\n";
}

export async function calc(options: CalcOptions, io: Io): Promise<number> {
  const input = options.input;
  if (!fs.existsSync(input)) throw new UsageError(`cannot read ${input}: no such file`, 1);
  if (!fs.statSync(input).isFile()) throw new UsageError(`cannot read ${input}: not a file`, 1);
  const out = options.out ?? defaultOutput(input);
  if (path.extname(out).toLowerCase() !== ".xlsx") throw new UsageError(`the output ${out} must end in .xlsx`);
  if (sameFile(out, input)) throw new UsageError(`the output ${out} is the input workbook: spanwise never writes over its input`, 1);
  if (fs.existsSync(out) && !options.force) throw new UsageError(`${out} exists already: choose another --out, or add --force to replace it`, 1);

  let book;
  try {
    book = await readBook(input);
  } catch (error) {
    const raw = error instanceof Error ? error.message : String(error);
    const reason = /end of central directory|is this a zip/i.test(raw) ? "the file is not a zip archive, as every .xlsx is" : raw.split(/\s+see https?:/)[0];
    throw new UsageError(`cannot read ${input}: it is not a readable .xlsx workbook (${reason})`, 1);
  }
  if (options.csv !== undefined && !book.sheets.some((sheet) => sheet.name === options.csv)) {
    throw new UsageError(`no sheet named "${options.csv}" in ${input}; its sheets are: ${book.sheets.map((s) => s.name).join(", ")}`, 1);
  }

  const large = book.spanCallCount + book.formulaCount >= PROGRESS_THRESHOLD;
  const bar = large
    ? new cliProgress.SingleBar(
        { stream: io.stderr as NodeJS.WritableStream, format: "{phase} [{bar}] {percentage}% {value}/{total}", hideCursor: true },
        cliProgress.Presets.shades_classic,
      )
    : undefined;
  let calls = 0;
  bar?.start(Math.max(1, book.spanCallCount), 0, { phase: "solving  " });
  const evaluated = new SpanWorkbook(book.sheets, {
    onSpanCall: bar ? () => bar.update(Math.min(++calls, book.spanCallCount), { phase: "solving  " }) : undefined,
  });
  bar?.setTotal(Math.max(1, book.formulaCount));
  bar?.update(0, { phase: "storing  " });
  let stored = 0;
  storeResults(book, evaluated, bar ? () => bar.update(++stored, { phase: "storing  " }) : undefined);
  bar?.stop();

  const temporary = path.join(path.dirname(out), `.${path.basename(out)}.${process.pid}.tmp`);
  try {
    await book.workbook.xlsx.writeFile(temporary);
    fs.renameSync(temporary, out);
  } catch (error) {
    fs.rmSync(temporary, { force: true });
    throw new UsageError(`cannot write ${out}: ${error instanceof Error ? error.message : String(error)}`, 1);
  }

  let errors = 0;
  for (const name of evaluated.sheetNames()) {
    const id = evaluated.sheetId(name);
    for (const address of evaluated.formulaCells(id)) {
      const value = evaluated.getValue(id, address.row, address.col);
      if (isCellError(value)) {
        errors++;
        if (errors <= 5) io.stderr.write(`  ${evaluated.addressText(address, true)}: ${value.error} ${value.message}\n`);
      }
    }
  }
  if (errors > 5) io.stderr.write(`  ... and ${errors - 5} more formula cells with errors\n`);
  io.stderr.write(
    `spanwise: evaluated ${book.formulaCount} formulas (${book.spanCallCount} SPAN calls) in ${book.sheets.length} sheets` +
      `${errors ? `, ${errors} with errors` : ""}; wrote ${out}\n`,
  );
  if (options.csv !== undefined) io.stdout.write(toCsv(evaluated.getSheetValues(evaluated.sheetId(options.csv))));
  evaluated.destroy();
  return 0;
}
