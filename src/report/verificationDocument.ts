/**
 * The verification document as a PrintDocument: what was run and on what, the summary per
 * worksheet function, then every case with its source, input, and each compared value (expected,
 * computed, relative difference, pass or fail). Pure: the verification and build info in.
 */
import type { Verification } from "../verify/run";
import { memberLines, num } from "./describe";
import type { Block, PrintDocument } from "./document";
import { CAUTION, footerLines, type BuildInfo } from "./meta";

export const EDITION_NOTE =
  "Sources are cited as each case gives them. A source marked \"from memory\" was written without the book at hand: its edition is not known, and the expected value rests on the closed-form formula stated, not on a page of a particular printing.";

export function verificationDocument(v: Verification, info: BuildInfo): PrintDocument {
  const failed = v.cases.filter((c) => !c.pass);
  const checks = v.summary.reduce((s, f) => s + f.checks, 0);
  const passed = v.summary.reduce((s, f) => s + f.passed, 0);
  const blocks: Block[] = [
    { kind: "heading", level: 1, text: "Spanwise verification document" },
    { kind: "text", tone: "caution", text: CAUTION },
    {
      kind: "table",
      columns: ["Item", "Value"],
      widths: [1, 3],
      rows: [
        ["Software", `Spanwise ${info.version}`],
        ["Commit", info.commit],
        ["Platform", info.platform],
        ["Date of run", info.date],
        ["Method", "Each case is solved by the Spanwise core. Handbook cases: every compared value is checked against the closed-form value of its source. Independent-reference cases: against an independent computation (the force method in BigInt fixed point), on members no handbook tabulates."],
        ["Acceptance", `relative difference <= ${v.tolerance}: for handbook cases relative to the value (an expected zero against the member's own scale of that quantity); for independent-reference cases relative to the quantity's own largest magnitude on the member`],
        ["Cases", `${v.cases.length} (${v.cases.length - failed.length} passed, ${failed.length} failed)`],
        ["Compared values", `${checks} (${passed} passed, ${checks - passed} failed)`],
        ["Result", v.pass ? "PASS: every case agrees with its source" : `FAIL: ${failed.map((c) => c.name).join("; ")}`],
      ],
      tones: [...Array(8).fill("normal"), v.pass ? "pass" : "fail"],
    },
    { kind: "text", tone: "muted", text: EDITION_NOTE },
    { kind: "heading", level: 2, text: "Summary per function" },
    {
      kind: "table",
      columns: ["Function", "Compared values", "Passed", "Failed"],
      align: ["left", "right", "right", "right"],
      rows: v.summary.map((f) => [f.fn, String(f.checks), String(f.passed), String(f.checks - f.passed)]),
      tones: v.summary.map((f) => (f.passed === f.checks ? "normal" : "fail")),
    },
    { kind: "text", tone: "muted", text: "Each row counts the compared values whose worksheet function reports that quantity; the comparison runs the same core computation the function calls." },
    { kind: "heading", level: 2, text: "Cases" },
  ];
  v.cases.forEach((c, i) => {
    blocks.push({ kind: "heading", level: 3, text: `${i + 1}. ${c.name}: ${c.pass ? "PASS" : "FAIL"}` });
    blocks.push({ kind: "text", text: `Source: ${c.source}` });
    for (const line of memberLines(c.member)) blocks.push({ kind: "text", text: `Input ${line}` });
    if (c.error) blocks.push({ kind: "text", tone: "fail", text: `The solver failed on this case: ${c.error}` });
    blocks.push({
      kind: "table",
      columns: ["Compared value", "Function", "Expected", "Computed", "Rel. diff.", "Result"],
      widths: [2.6, 1.6, 1.7, 1.7, 1, 0.7],
      align: ["left", "left", "right", "right", "right", "left"],
      rows: c.rows.map((r) => [r.label, r.fn, num(r.expected), num(r.computed), Number.isFinite(r.relDiff) ? r.relDiff.toExponential(1) : "n/a", r.pass ? "pass" : "FAIL"]),
      tones: c.rows.map((r) => (r.pass ? "normal" : "fail")),
    });
  });
  return { title: "Spanwise verification document", footer: footerLines(info, CAUTION), blocks };
}
