/**
 * `spanwise calc` in pipelines: exit codes, --report, --csv (prints, writes nothing), CSV
 * numbers and formula-like text, --help on every command, safe writes (a planted link is never
 * written through) and crafted array ranges refused fast.
 */
import fs from "fs";
import os from "os";
import path from "path";
import ExcelJS from "exceljs";
import JSZip from "jszip";
import { main } from "../../src/cli/main";
import { csvField, csvNumber, csvText } from "../../src/cli/csv";
import { writeFileSafely } from "../../src/cli/safeWrite";
import { storeAsDynamicArrays } from "../../src/cli/dynamicArrays";

function capture(): { io: { stdout: { write(t: string): boolean }; stderr: { write(t: string): boolean } }; out: () => string; err: () => string } {
  let out = "";
  let err = "";
  return {
    io: { stdout: { write: (t: string) => ((out += t), true) }, stderr: { write: (t: string) => ((err += t), true) } },
    out: () => out,
    err: () => err,
  };
}

async function book(file: string, rows: (string | number | { formula: string })[][], dynamic = false): Promise<void> {
  const workbook = new ExcelJS.Workbook();
  const sheet = workbook.addWorksheet("S");
  rows.forEach((row) => sheet.addRow(row));
  const bytes = Buffer.from(await workbook.xlsx.writeBuffer());
  fs.writeFileSync(file, dynamic ? await storeAsDynamicArrays(bytes) : bytes);
}

describe("spanwise calc for pipelines", () => {
  let dir: string;
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-batch-"));
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it("exits 0 when every formula evaluates, 1 with the error cells listed and reported", async () => {
    const good = path.join(dir, "good.xlsx");
    await book(good, [["6 8 6", "udl 2.5 D", { formula: "_xldudf_SPAN_MOMENT(A1,B1,3)" }]]);
    const ok = capture();
    expect(await main(["calc", good], ok.io)).toBe(0);
    expect(fs.existsSync(path.join(dir, "good.calculated.xlsx"))).toBe(true);

    const bad = path.join(dir, "bad.xlsx");
    await book(bad, [["6 8 6", "point 10 at 30 L", { formula: "_xldudf_SPAN_MOMENT(A1,B1,3)" }, { formula: "1/0" }]]);
    const report = path.join(dir, "errors.csv");
    const failed = capture();
    expect(await main(["calc", bad, "--report", report], failed.io)).toBe(1);
    expect(failed.err()).toMatch(/S!C1: #VALUE! .*30/);
    expect(failed.err()).toContain("S!D1: #DIV/0!");
    const lines = fs.readFileSync(report, "utf8").trim().split("\n");
    expect(lines[0]).toBe("sheet,cell,error,message");
    expect(lines.slice(1).map((line) => line.split(",").slice(0, 3).join(","))).toEqual(["S,C1,#VALUE!", "S,D1,#DIV/0!"]);
  });

  it("evaluates shared formulas in every cell of their group", async () => {
    const input = path.join(dir, "shared.xlsx");
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet("S");
    [1, 2, 3].forEach((n, i) => (sheet.getCell(i + 1, 1).value = n));
    sheet.getCell("B1").value = { formula: "A1*2", shareType: "shared", ref: "B1:B3" } as ExcelJS.CellValue;
    sheet.getCell("B2").value = { sharedFormula: "B1" } as ExcelJS.CellValue;
    sheet.getCell("B3").value = { sharedFormula: "B1" } as ExcelJS.CellValue;
    fs.writeFileSync(input, Buffer.from(await workbook.xlsx.writeBuffer()));
    const xml = await (await JSZip.loadAsync(fs.readFileSync(input))).file("xl/worksheets/sheet1.xml")!.async("string");
    expect(xml).toMatch(/<f t="shared" si="0"\/>/);
    const run = capture();
    expect(await main(["calc", input, "--csv", "S"], run.io)).toBe(0);
    expect(run.out()).toBe("1,2\n2,4\n3,6\n");
  });

  it("exits 2 on wrong usage, 3 on unreadable input, 4 when the output may not be written", async () => {
    expect(await main(["calc", "--bogus"], capture().io)).toBe(2);
    expect(await main(["calc"], capture().io)).toBe(2);
    const missing = capture();
    expect(await main(["calc", path.join(dir, "none.xlsx")], missing.io)).toBe(3);
    expect(missing.err()).toContain("no such file");
    const text = path.join(dir, "text.xlsx");
    fs.writeFileSync(text, "not a zip");
    expect(await main(["calc", text], capture().io)).toBe(3);
    const good = path.join(dir, "again.xlsx");
    await book(good, [[1, { formula: "A1+1" }]]);
    const out = path.join(dir, "again-out.xlsx");
    fs.writeFileSync(out, "keep me");
    const exists = capture();
    expect(await main(["calc", good, "--out", out], exists.io)).toBe(4);
    expect(exists.err()).toContain("--force");
    expect(fs.readFileSync(out, "utf8")).toBe("keep me");
    expect(await main(["calc", good, "--out", good], capture().io)).toBe(4);
  });

  it("--csv prints the sheet and writes nothing, numbers at 15 digits, formula-like text escaped", async () => {
    const input = path.join(dir, "csv.xlsx");
    await book(input, [[0.1, { formula: "A1*3" }, "=HYPERLINK(1)", "-2 kN", "@SUM", "plain, text"]]);
    const before = fs.readdirSync(dir).sort();
    const run = capture();
    expect(await main(["calc", input, "--csv", "S"], run.io)).toBe(0);
    expect(run.out()).toBe(`0.1,0.3,"'=HYPERLINK(1)","'-2 kN","'@SUM","plain, text"\n`);
    expect(fs.readdirSync(dir).sort()).toEqual(before);
    const twice = capture();
    expect(await main(["calc", input, "--csv", "S"], twice.io)).toBe(0);
    expect(twice.out()).toBe(run.out());
    // OWASP "CSV Injection": a leading =, +, -, @, tab or carriage return is neutralised.
    for (const lead of ["=", "+", "-", "@", "\t", "\r"]) expect(csvText(`${lead}1`)).toMatch(/^"'/);
    expect(csvNumber(2.9999999999999996)).toBe("3");
    expect(csvNumber(0.1 + 0.2)).toBe("0.3");
    expect(csvNumber(123456789012345.6)).toBe("123456789012346");
    expect(csvField(-2)).toBe("-2");
  });

  it("answers --help on every command and tells what calc writes", async () => {
    for (const command of ["calc", "demo", "start"]) {
      const help = capture();
      expect(await main([command, "--help"], help.io)).toBe(0);
      expect(help.out()).toContain(`spanwise ${command}`);
    }
    const calcHelp = capture();
    await main(["calc", "--help"], calcHelp.io);
    expect(calcHelp.out()).toContain("only the formulas' cached values have changed");
    expect(calcHelp.out()).toMatch(/exit codes: 0 .*1 .*2 .*3 .*4/s);
  });

  it("never writes through a planted link", async () => {
    const input = path.join(dir, "linked.xlsx");
    await book(input, [[1, { formula: "A1+1" }]]);
    const inputBytes = fs.readFileSync(input);
    // The output name is a link to the input: refused even with --force.
    const link = path.join(dir, "link-out.xlsx");
    fs.symlinkSync(input, link);
    const before = fs.readdirSync(dir).sort();
    expect(await main(["calc", input, "--out", link, "--force"], capture().io)).toBe(4);
    expect(fs.readFileSync(input).equals(inputBytes)).toBe(true);
    expect(fs.readdirSync(dir).sort()).toEqual(before);
    // A link planted at the temporary name: the exclusive open fails, the victim is untouched.
    const victim = path.join(dir, "victim.txt");
    fs.writeFileSync(victim, "victim");
    fs.symlinkSync(victim, path.join(dir, ".planted.tmp"));
    expect(() => writeFileSafely(path.join(dir, "new.xlsx"), Buffer.from("data"), input, false, () => ".planted.tmp")).toThrow(/EEXIST/);
    expect(fs.readFileSync(victim, "utf8")).toBe("victim");
    expect(fs.existsSync(path.join(dir, "new.xlsx"))).toBe(false);
  });

  it("refuses crafted array ranges fast, with the cell and the range named", async () => {
    const input = path.join(dir, "crafted.xlsx");
    await book(input, [[1, 2, { formula: "A1:B1*2" }], [5, 6]], true);
    const zip = await JSZip.loadAsync(fs.readFileSync(input));
    const sheetXml = await zip.file("xl/worksheets/sheet1.xml")!.async("string");
    const cases: [string, RegExp][] = [
      ['ref="C1:XFD1048576"', /refused|covers|beyond|overlaps/],
      ['ref="C1:XFE1"', /beyond the sheet/],
      ['ref="C1:C1048577"', /beyond the sheet|not a cell range/],
      ['ref="A1:C2"', /does not start at its own cell/],
      ['ref="C1:D2;DROP"', /not a cell range/],
    ];
    for (const [ref, message] of cases) {
      const crafted = path.join(dir, "crafted-1.xlsx");
      zip.file("xl/worksheets/sheet1.xml", sheetXml.replace('ref="C1"', ref));
      fs.writeFileSync(crafted, await zip.generateAsync({ type: "nodebuffer" }));
      const run = capture();
      const status = await main(["calc", crafted, "--out", path.join(dir, "crafted-out.xlsx"), "--force"], run.io);
      if (ref === 'ref="C1:XFD1048576"') {
        // A range the sheet can hold is legal; its stale area is simply emptied, and that is quick.
        expect(status).toBe(0);
      } else {
        expect({ ref, status }).toEqual({ ref, status: 3 });
        expect(run.err()).toMatch(message);
        expect(run.err()).toContain("S!C1");
      }
    }
    // A range over another formula is refused.
    const over = path.join(dir, "crafted-2.xlsx");
    const twoFormulas = sheetXml.replace('ref="C1"', 'ref="C1:C2"');
    zip.file("xl/worksheets/sheet1.xml", twoFormulas.replace(/(<c r="B2"[^>]*>(?:<v>6<\/v>)?<\/c>)/, '$1<c r="C2"><f>1+1</f></c>'));
    fs.writeFileSync(over, await zip.generateAsync({ type: "nodebuffer" }));
    const covered = capture();
    expect(await main(["calc", over, "--out", path.join(dir, "crafted-out2.xlsx"), "--force"], covered.io)).toBe(3);
    expect(covered.err()).toContain("covers the formula in C2");
  });
});
