/**
 * `spanwise report <book.xlsx> (--cell Sheet!A5 | --range Sheet!A5:A20) [--out file.pdf|.html]
 * [--paper A4|letter] [--force]`: the member calculation report of a SPAN cell, or of every
 * member SPAN cell of a range (one report each, each starting on a new page, in one file).
 *
 * The workbook is computed by the engine and read as the pane reads it: the cell's formula is
 * parsed and its member arguments resolved by src/pane/memberFromSheet.ts over a read-only host
 * (bookHost.ts), so the report obeys the worksheet functions' rules. The title block comes from
 * a sheet named "Title" (titleBlock.ts). The workbook is never written.
 */
import * as fs from "fs";
import * as path from "path";
import { SpanWorkbook, normalizeFormula, type SheetInput } from "../engine";
import { parseBlock, blockText } from "../pane/addresses";
import { qualify, splitAddress } from "../pane/host";
import { cellKindOf, findMember } from "../pane/memberFromSheet";
import { memberReport } from "../pane/report";
import { MAX_CANDIDATES, checksFor, type FormulaCell } from "../pane/reportChecks";
import { parseSpanFormula } from "../pane/formulaRefs";
import type { Block, PrintDocument } from "../report/document";
import { renderHtml } from "../report/html";
import type { BuildInfo } from "../report/meta";
import { renderPdf } from "../report/pdf";
import { EMPTY_TITLE, TITLE_ROWS, TITLE_SHEET, titleFromRows, type TitleBlock } from "../report/titleBlock";
import { BookHost } from "./bookHost";
import { buildInfo } from "./buildInfo";
import { UsageError, type Io } from "./io";
import { formatOf, paperOf, writeOutput } from "./verify";
import { readBook } from "./xlsxBook";

/** Cells of a --range looked at, at most, and reports written, at most. */
export const MAX_RANGE_CELLS = 2000;
export const MAX_REPORTS = 50;

export interface ReportOptions {
  input: string;
  cell?: string;
  range?: string;
  out?: string;
  paper?: string;
  force: boolean;
  info?: BuildInfo;
}

function target(text: string, what: string): { sheet: string; range: string } {
  const { sheet, address } = splitAddress(text.trim());
  if (!sheet) throw new UsageError(`--${what} needs a sheet-qualified address such as Sheet1!A5, not "${text}"`);
  try {
    parseBlock(address);
  } catch {
    throw new UsageError(`--${what}: "${address}" is not a cell address`);
  }
  return { sheet, range: address };
}

export async function report(options: ReportOptions, io: Io): Promise<number> {
  if ((options.cell === undefined) === (options.range === undefined)) throw new UsageError("report needs one of --cell Sheet!A5 or --range Sheet!A5:A20");
  const where = options.cell !== undefined ? target(options.cell, "cell") : target(options.range!, "range");
  const block = parseBlock(where.range);
  if (options.cell !== undefined && (block.from.row !== block.to.row || block.from.col !== block.to.col)) throw new UsageError(`--cell takes one cell; use --range for ${where.range}`);
  const cells = (block.to.row - block.from.row + 1) * (block.to.col - block.from.col + 1);
  if (cells > MAX_RANGE_CELLS) throw new UsageError(`--range covers ${cells} cells; at most ${MAX_RANGE_CELLS} are looked at`);
  const out = options.out ?? `${options.input.replace(/\.xlsx$/i, "")}.report.pdf`;
  const format = formatOf(out);
  const paper = paperOf(options.paper);
  if (path.resolve(out) === path.resolve(options.input)) throw new UsageError("--out must not be the input workbook", 1);
  if (fs.existsSync(out) && !options.force) throw new UsageError(`${out} exists already: choose another --out, or add --force to replace it`, 1);
  if (!fs.existsSync(options.input)) throw new UsageError(`cannot read ${options.input}: no such file`, 1);

  let loaded;
  try {
    loaded = await readBook(fs.readFileSync(options.input));
  } catch (error) {
    throw new UsageError(`cannot read ${options.input}: ${error instanceof Error ? error.message : String(error)}`, 1);
  }
  // The engine over the cells as saved (not evaluateBook, which replaces a plain formula whose
  // result spills): the report reads each SPAN cell's own formula and arguments.
  const book = new SpanWorkbook(loaded.inputs, { names: loaded.names });
  try {
    const host = new BookHost(book);
    let sheet: string;
    try {
      sheet = host.sheetName(where.sheet);
    } catch (error) {
      throw new UsageError(`${error instanceof Error ? error.message : String(error)}`, 1);
    }
    const title = await titleOf(host);
    const candidates = spanFormulaCells(loaded.inputs, MAX_CANDIDATES + 1);
    const info = options.info ?? buildInfo();
    const docs: PrintDocument[] = [];
    const problems: string[] = [];
    for (let r = block.from.row; r <= block.to.row; r++) {
      for (let c = block.from.col; c <= block.to.col; c++) {
        const cell = blockText({ from: { row: r, col: c }, to: { row: r, col: c } });
        const at = qualify(sheet, cell);
        const formula = host.formulaAt(sheet, cell);
        if (options.range !== undefined) {
          const parsed = parseSpanFormula(formula);
          if (!parsed.ok || cellKindOf(parsed.call) !== "member") continue;
        }
        if (docs.length >= MAX_REPORTS) {
          problems.push(`${at}: more than ${MAX_REPORTS} member cells in the range; the rest are not reported`);
          break;
        }
        host.select(sheet, cell);
        const found = await findMember(host, await host.getSelection());
        if (!found.ok) {
          problems.push(`${at}: ${found.message.replace(/^[A-Z]+\d+: /, "")}`);
          continue;
        }
        const mark = options.range !== undefined ? [title.mark, at].filter(Boolean).join(" ") : title.mark;
        const checks = found.member.kind === "member" ? await checksFor(host, found.member, candidates) : undefined;
        for (const p of checks?.problems ?? []) if (!problems.includes(p)) problems.push(p);
        const doc = memberReport({ member: found.member, formula: formula === undefined ? "" : normalizeFormula(formula), title: { ...title, mark }, checks }, info);
        if ("error" in doc) {
          problems.push(doc.error);
          continue;
        }
        docs.push(doc);
      }
    }
    for (const p of problems) io.stderr.write(`spanwise: ${p}\n`);
    if (docs.length === 0) {
      if (problems.length === 0) io.stderr.write(`spanwise: ${qualify(sheet, where.range)} holds no SPAN member formula\n`);
      return 1;
    }
    const doc = combine(docs);
    writeOutput(out, format === "pdf" ? await renderPdf(doc, paper) : renderHtml(doc, paper), options.force);
    io.stdout.write(`${docs.length} member report${docs.length === 1 ? "" : "s"}; wrote ${out}\n`);
    return problems.length ? 1 : 0;
  } finally {
    book.destroy();
  }
}

async function titleOf(host: BookHost): Promise<TitleBlock> {
  try {
    const sheet = host.sheetName(TITLE_SHEET);
    return titleFromRows(await host.getValues(qualify(sheet, `A1:B${TITLE_ROWS}`)));
  } catch {
    return { ...EMPTY_TITLE };
  }
}

/** The SPAN formula cells of the workbook as saved, sheet by sheet and row by row, at most `limit`. */
function spanFormulaCells(inputs: readonly SheetInput[], limit: number): FormulaCell[] {
  const out: FormulaCell[] = [];
  for (const sheet of inputs) {
    for (let r = 0; r < sheet.cells.length; r++) {
      const row = sheet.cells[r] ?? [];
      for (let c = 0; c < row.length; c++) {
        const input = row[c];
        if (typeof input !== "string" || !input.startsWith("=") || !/SPAN/i.test(input)) continue;
        out.push({ sheet: sheet.name, cell: blockText({ from: { row: r, col: c }, to: { row: r, col: c } }), formula: input });
        if (out.length >= limit) return out;
      }
    }
  }
  return out;
}

function combine(docs: PrintDocument[]): PrintDocument {
  if (docs.length === 1) return docs[0];
  const blocks: Block[] = [];
  docs.forEach((d, i) => {
    if (i > 0) blocks.push({ kind: "pageBreak" });
    blocks.push(...d.blocks);
  });
  return { title: `Member calculations (${docs.length})`, footer: docs[0].footer, blocks };
}
