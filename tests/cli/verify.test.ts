/**
 * `spanwise verify`: the document names every handbook case (the list the test suite runs), the
 * caution and the version; a broken case or a failing solver turns into exit code 1 (injected
 * through the options, never by editing the list); output format and paper are checked.
 */
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import { solve } from "../../src/core";
import { main } from "../../src/cli/main";
import { verify } from "../../src/cli/verify";
import { CAUTION } from "../../src/report/meta";
import { handbookCases } from "../../src/verify/cases";
import { pdfPages, pdfText } from "../report/pdfText";

// eslint-disable-next-line @typescript-eslint/no-require-imports
const VERSION = (require("../../package.json") as { version: string }).version;

function sink() {
  const out: string[] = [];
  const err: string[] = [];
  return { io: { stdout: { write: (t: string) => out.push(t) }, stderr: { write: (t: string) => err.push(t) } }, out, err };
}

let dir: string;
beforeAll(() => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-verify-"));
});
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe("spanwise verify", () => {
  let pdf = "";
  let html = "";

  beforeAll(async () => {
    const a = sink();
    expect(await main(["verify", "--out", path.join(dir, "v.pdf")], a.io)).toBe(0);
    pdf = pdfText(fs.readFileSync(path.join(dir, "v.pdf")));
    const b = sink();
    expect(await main(["verify", "--out", path.join(dir, "v.html")], b.io)).toBe(0);
    html = fs.readFileSync(path.join(dir, "v.html"), "utf8");
  });

  it("names every case with its verdict, the caution, the version and a pass result, in the PDF", () => {
    expect(handbookCases.length).toBeGreaterThanOrEqual(15);
    handbookCases.forEach((c, i) => expect(pdf).toContain(`${i + 1}. ${c.name}: PASS`));
    expect(pdf).toContain(CAUTION);
    expect(pdf).toContain(`Spanwise ${VERSION}`);
    expect(pdf).toContain("PASS: every case agrees with its source");
    expect(pdf).not.toMatch(/\bFAIL\b/);
  });

  it("states each case's source and the functions summarised", () => {
    for (const c of handbookCases) expect(pdf.replace(/\n/g, " ")).toContain(c.source.slice(0, 40));
    for (const fn of ["SPAN.REACTIONS", "SPAN.EXTREMES", "SPAN.MOMENT", "SPAN.DEFLECTION"]) expect(pdf).toContain(fn);
  });

  it("writes the same cases, caution and version into print-ready HTML", () => {
    const escape = (t: string) => t.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
    for (const c of handbookCases) expect(html).toContain(escape(c.name));
    expect(html).toContain(escape(CAUTION));
    expect(html).toContain(`Spanwise ${VERSION}`);
    expect(html).toMatch(/@page \{ size: A4;/);
    expect(html).not.toMatch(/<script|https?:\/\//);
  });

  it("exits 1 and marks the case FAIL when an expected value is wrong (injected copy, list untouched)", async () => {
    const good = handbookCases[0];
    const broken = { ...good, name: "deliberately broken copy", checks: good.checks.map((ch, i) => (i === 0 && "reaction" in ch ? { ...ch, force: (ch.force ?? 0) * 1.001 } : ch)) };
    const s = sink();
    const out = path.join(dir, "broken.pdf");
    expect(await verify({ out, force: false, cases: [good, broken] }, s.io)).toBe(1);
    const text = pdfText(fs.readFileSync(out));
    expect(text).toContain("2. deliberately broken copy: FAIL");
    expect(text).toContain("1. " + good.name + ": PASS");
    expect(s.err.join("")).toContain("verification failed: deliberately broken copy");
    expect(handbookCases[0].checks).toEqual(good.checks);
  });

  it("exits 1 when the solver is off by a part in 1e8, or throws", async () => {
    const off = (m: Parameters<typeof solve>[0]) => {
      const s = solve(m);
      return { ...s, reactions: s.reactions.map((r) => ({ ...r, force: r.force * (1 + 1e-8) })) };
    };
    expect(await verify({ out: path.join(dir, "off.html"), force: false, solver: off }, sink().io)).toBe(1);
    const throws = () => {
      throw new Error("solver unavailable");
    };
    const s = sink();
    expect(await verify({ out: path.join(dir, "throws.html"), force: false, cases: handbookCases.slice(0, 1), solver: throws }, s.io)).toBe(1);
    expect(fs.readFileSync(path.join(dir, "throws.html"), "utf8")).toContain("The solver failed on this case: solver unavailable");
  });

  it("writes US letter on request and refuses a bad paper, a bad extension, or replacing a file without --force", async () => {
    const out = path.join(dir, "letter.pdf");
    expect(await main(["verify", "--out", out, "--paper", "letter"], sink().io)).toBe(0);
    const pages = pdfPages(fs.readFileSync(out));
    expect(pages.mediaBox).toEqual([0, 0, 612, 792]);
    expect(pages.count).toBeGreaterThan(1);
    const again = sink();
    expect(await main(["verify", "--out", out], again.io)).toBe(1);
    expect(again.err.join("")).toContain("exists already");
    expect(await main(["verify", "--out", out, "--force"], sink().io)).toBe(0);
    const bad = sink();
    expect(await main(["verify", "--out", path.join(dir, "v.docx")], bad.io)).toBe(2);
    expect(bad.err.join("")).toContain("must end in .pdf or .html");
    expect(await main(["verify", "--out", path.join(dir, "x.pdf"), "--paper", "A3"], sink().io)).toBe(2);
    expect(fs.existsSync(path.join(dir, "x.pdf"))).toBe(false);
  });
});
