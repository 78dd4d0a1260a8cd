/**
 * `spanwise calc <book.xlsx> [--out <file.xlsx>] [--force] [--report <errors.csv>]` and
 * `spanwise calc <book.xlsx> --csv <sheet>`: evaluates every formula of a workbook, SPAN
 * functions included. It writes a copy of the workbook in which only the cached values of the
 * formula cells (and of the cells their spills cover) have changed, or, with --csv, prints one
 * sheet's values and writes no workbook. The input is only read, never written.
 *
 * Exit codes (EXIT below): 0 every formula evaluated; 1 some formula cells are errors (each
 * listed on stderr with its message, all of them in --report); 2 wrong usage; 3 the input
 * cannot be read or is refused; 4 the output cannot be written or would replace the input;
 * 5 an unexpected failure (a bug: please report it with the workbook).
 */
import fs from "fs";
import path from "path";
import cliProgress from "cli-progress";
import { toCsv, csvText } from "./csv";
import { UsageError, type Io } from "./io";
import { checkOutput, writeFileSafely, WriteRefused } from "./safeWrite";
import { BookError, evaluateBook, readBook, storeResults, type CellProblem } from "./xlsxBook";
import { PackageError } from "./xlsxPackage";

export const EXIT = { ok: 0, cellErrors: 1, usage: 2, badInput: 3, cannotWrite: 4, internal: 5 } as const;

export interface CalcOptions {
  input: string;
  out?: string;
  csv?: string;
  report?: string;
  force: boolean;
}

/** Books with at least this many SPAN calls or formulas get a progress bar. */
const PROGRESS_THRESHOLD = 300;
/** Error cells listed on stderr; --report has them all. */
const LISTED_ERRORS = 20;

export function defaultOutput(input: string): string {
  const { dir, name } = path.parse(input);
  return path.join(dir, `${name}.calculated.xlsx`);
}

function reportCsv(problems: readonly CellProblem[]): string {
  const lines = problems.map((p) => [p.sheet, p.address, p.error, p.message].map(csvText).join(","));
  return ["sheet,cell,error,message", ...lines].join("\n") + "\n";
}

function refuse(kind: "badInput" | "cannotWrite", message: string): never {
  throw new UsageError(message, EXIT[kind]);
}

export async function calc(options: CalcOptions, io: Io): Promise<number> {
  const input = options.input;
  if (options.csv !== undefined && options.out !== undefined) throw new UsageError("--csv prints one sheet and writes no workbook: leave out --out");
  const out = options.csv === undefined ? (options.out ?? defaultOutput(input)) : undefined;
  if (out !== undefined && path.extname(out).toLowerCase() !== ".xlsx") throw new UsageError(`the output ${out} must end in .xlsx`);
  if (options.report !== undefined && path.extname(options.report).toLowerCase() !== ".csv") throw new UsageError(`the report ${options.report} must end in .csv`);

  let bytes: Buffer;
  try {
    if (!fs.statSync(input).isFile()) refuse("badInput", `cannot read ${input}: not a file`);
    bytes = fs.readFileSync(input);
  } catch (error) {
    if (error instanceof UsageError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    refuse("badInput", `cannot read ${input}: ${code === "ENOENT" ? "no such file" : error instanceof Error ? error.message : String(error)}`);
  }
  try {
    for (const target of [out, options.report]) if (target !== undefined) checkOutput(target, input, options.force);
  } catch (error) {
    if (error instanceof WriteRefused) refuse("cannotWrite", error.message);
    throw error;
  }

  let book;
  try {
    book = await readBook(bytes);
  } catch (error) {
    // Anything that stops the package from being read (a damaged zip entry as much as a bad part) is the input's fault.
    const reason = error instanceof BookError || error instanceof PackageError ? error.message : error instanceof Error ? error.message.split(/\s+see https?:/)[0] : String(error);
    refuse("badInput", `cannot read ${input}: it is not a readable .xlsx workbook (${reason})`);
  }
  if (options.csv !== undefined && !book.sheets.some((sheet) => sheet.name === options.csv)) {
    refuse("badInput", `no sheet named "${options.csv}" in ${input}; its sheets are: ${book.sheets.map((s) => s.name).join(", ")}`);
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
  const evaluated = evaluateBook(book, bar ? () => bar.update(Math.min(++calls, book.spanCallCount), { phase: "solving  " }) : undefined);
  bar?.setTotal(Math.max(1, book.formulaCount));
  bar?.update(0, { phase: "storing  " });
  let stored = 0;
  const { problems } = await storeResults(book, evaluated, bar ? () => bar.update(++stored, { phase: "storing  " }) : undefined);
  bar?.stop();
  const csv = options.csv === undefined ? undefined : toCsv(evaluated.getSheetValues(evaluated.sheetId(options.csv)));
  // The engine is done: let it go before the package is compressed (big schedules).
  evaluated.destroy();

  try {
    if (out !== undefined) writeFileSafely(out, await book.pkg.write(), input, options.force);
    if (options.report !== undefined) writeFileSafely(options.report, Buffer.from(reportCsv(problems)), input, options.force);
  } catch (error) {
    refuse("cannotWrite", `cannot write ${out ?? options.report}: ${error instanceof Error ? error.message : String(error)}`);
  }

  for (const problem of problems.slice(0, LISTED_ERRORS)) io.stderr.write(`  ${problem.sheet}!${problem.address}: ${problem.error} ${problem.message}\n`);
  if (problems.length > LISTED_ERRORS) {
    io.stderr.write(`  ... and ${problems.length - LISTED_ERRORS} more formula cells with errors${options.report ? ` (all in ${options.report})` : " (add --report errors.csv for all)"}\n`);
  }
  io.stderr.write(
    `spanwise: evaluated ${book.formulaCount} formulas (${book.spanCallCount} SPAN calls) in ${book.sheets.length} sheets` +
      `${problems.length ? `, ${problems.length} with errors` : ""}${out ? `; wrote ${out}` : ""}${options.report ? `; report ${options.report}` : ""}\n`,
  );
  if (csv !== undefined) io.stdout.write(csv);
  return problems.length > 0 ? EXIT.cellErrors : EXIT.ok;
}
