/**
 * `spanwise verify [--out verification.pdf|.html] [--paper A4|letter] [--force]`: runs the
 * handbook and independent-reference cases (src/verify/cases, the lists the test suite runs:
 * tests/core/handbook.test.ts and tests/verify/crosscheck.test.ts) and writes the verification
 * document. Exit code 0 when every case agrees with its source, 1 when any fails (the document is
 * still written, showing what failed), 2 for a usage error.
 */
import * as fs from "fs";
import * as path from "path";
import type { Member, Solution } from "../core";
import type { PaperSize } from "../report/document";
import { renderHtml } from "../report/html";
import type { BuildInfo } from "../report/meta";
import { renderPdf } from "../report/pdf";
import { verificationDocument } from "../report/verificationDocument";
import { handbookCases, verificationCases, type HandbookCase } from "../verify/cases";
import { runVerification } from "../verify/run";
import { buildInfo } from "./buildInfo";
import { UsageError, type Io } from "./io";

export interface VerifyOptions {
  out?: string;
  paper?: string;
  force: boolean;
  /** The cases and solver to run: the shipped list and the real solver unless a test says otherwise. */
  cases?: readonly HandbookCase[];
  solver?: (m: Member) => Solution;
  info?: BuildInfo;
}

export function paperOf(text: string | undefined): PaperSize {
  if (text === undefined) return "A4";
  const t = text.trim().toLowerCase();
  if (t === "a4") return "A4";
  if (t === "letter") return "letter";
  throw new UsageError(`--paper must be A4 or letter, not "${text}"`);
}

/** The output format from the file name: .pdf or .html (.htm), anything else refused. */
export function formatOf(file: string): "pdf" | "html" {
  const ext = path.extname(file).toLowerCase();
  if (ext === ".pdf") return "pdf";
  if (ext === ".html" || ext === ".htm") return "html";
  throw new UsageError(`${file}: the output must end in .pdf or .html`);
}

/** Writes bytes to `out`, refusing to replace an existing file without --force. */
export function writeOutput(out: string, bytes: Uint8Array | string, force: boolean): void {
  if (fs.existsSync(out) && !force) throw new UsageError(`${out} exists already: choose another --out, or add --force to replace it`, 1);
  const temporary = `${out}.partial-${process.pid}`;
  try {
    fs.writeFileSync(temporary, bytes);
    fs.renameSync(temporary, out);
  } finally {
    fs.rmSync(temporary, { force: true });
  }
}

export async function verify(options: VerifyOptions, io: Io): Promise<number> {
  const out = options.out ?? "verification.pdf";
  const format = formatOf(out);
  const paper = paperOf(options.paper);
  const cases = options.cases ?? verificationCases();
  const result = runVerification(cases, options.solver);
  const info = options.info ?? buildInfo();
  const doc = verificationDocument(result, info);
  writeOutput(out, format === "pdf" ? await renderPdf(doc, paper) : renderHtml(doc, paper), options.force);
  const failed = result.cases.filter((c) => !c.pass);
  const handbook = cases.filter((c) => handbookCases.includes(c)).length;
  io.stdout.write(`${result.cases.length} cases (${handbook} handbook, ${result.cases.length - handbook} independent-reference), ${failed.length} failed; wrote ${out}\n`);
  for (const c of failed) io.stderr.write(`spanwise: verification failed: ${c.name}${c.error ? ` (${c.error})` : ""}\n`);
  return result.pass ? 0 : 1;
}
