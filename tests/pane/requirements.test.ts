/**
 * Every Office/Excel API the pane's host adapter calls, with its requirement set, and the rule
 * that each one is either within the baseline the manifest declares (requirements.ts BASELINE)
 * or checked with isSetSupported before use. The sets are read from the office-js type
 * declarations, which carry the reference documentation's "[Api set: ExcelApi 1.12]" and
 * "Requirement set: DocumentEvents" notes (https://learn.microsoft.com/javascript/api/excel and
 * https://learn.microsoft.com/javascript/api/requirement-sets); checking optional sets at run
 * time with Office.context.requirements.isSetSupported follows
 * https://learn.microsoft.com/office/dev/add-ins/develop/initialize-add-in.
 * The scan uses the TypeScript checker on src/pane/officeHost.ts: a new API call there fails
 * this test until it is listed below with its set, and, above the baseline, guarded.
 */
import * as fs from "fs";
import * as path from "path";
import * as ts from "typescript";
import { BASELINE, DOCUMENT_EVENTS, OPTIONAL, versionAtLeast } from "../../src/pane/requirements";

const SOURCE = path.join(__dirname, "../../src/pane/officeHost.ts");

/**
 * Every API officeHost.ts uses and the set its declaration names: "-" where the declaration
 * carries no set note (the batch machinery: run, sync, load, isNullObject; the theme). Where a
 * note gives several versions ("1.1 for String,...,Range; 1.7 for Array") the first is the one
 * this code needs (only "Range" names are read).
 */
const USED: Record<string, string> = {
  "Excel.run": "-",
  "Excel.RequestContext.workbook": "-",
  "OfficeExtension.ClientRequestContext.sync": "-",
  "OfficeExtension.ClientObject.isNullObject": "-",
  "Excel.Workbook.getSelectedRange": "ExcelApi 1.1",
  "Excel.Workbook.worksheets": "ExcelApi 1.1",
  "Excel.Workbook.names": "ExcelApi 1.1",
  "Excel.WorksheetCollection.getActiveWorksheet": "ExcelApi 1.1",
  "Excel.WorksheetCollection.getItem": "ExcelApi 1.1",
  "Excel.Worksheet.getRange": "ExcelApi 1.1",
  "Excel.Worksheet.names": "ExcelApi 1.4",
  "Excel.Worksheet.charts": "ExcelApi 1.1",
  "Excel.Range.load": "-",
  "Excel.Range.address": "ExcelApi 1.1",
  "Excel.Range.values": "ExcelApi 1.1",
  "Excel.Range.formulas": "ExcelApi 1.1",
  "Excel.Range.worksheet": "ExcelApi 1.1",
  "Excel.Range.getCell": "ExcelApi 1.1",
  "Excel.Range.clear": "ExcelApi 1.1",
  "Excel.Range.getSpillingToRangeOrNullObject": "ExcelApi 1.12",
  "Excel.Range.getSpillParentOrNullObject": "ExcelApi 1.12",
  "Excel.NamedItemCollection.load": "-",
  "Excel.NamedItemCollection.items": "-",
  "Excel.NamedItemCollection.getItemOrNullObject": "ExcelApi 1.4",
  "Excel.NamedItem.name": "ExcelApi 1.1",
  "Excel.NamedItem.type": "ExcelApi 1.1",
  "Excel.NamedItem.value": "ExcelApi 1.1",
  "Excel.NamedItem.getRangeOrNullObject": "ExcelApi 1.4",
  "Excel.ChartCollection.add": "ExcelApi 1.1",
  "Excel.Chart.title": "ExcelApi 1.1",
  "Excel.Chart.series": "ExcelApi 1.1",
  "Excel.Chart.axes": "ExcelApi 1.1",
  "Excel.Chart.legend": "ExcelApi 1.1",
  "Excel.Chart.setPosition": "ExcelApi 1.1",
  "Excel.ChartTitle.text": "ExcelApi 1.1",
  "Excel.ChartSeriesCollection.getItemAt": "ExcelApi 1.1",
  "Excel.ChartSeriesCollection.add": "ExcelApi 1.7",
  "Excel.ChartSeries.name": "ExcelApi 1.1",
  "Excel.ChartSeries.setXAxisValues": "ExcelApi 1.7",
  "Excel.ChartSeries.setValues": "ExcelApi 1.7",
  "Excel.ChartAxes.categoryAxis": "ExcelApi 1.1",
  "Excel.ChartAxes.valueAxis": "ExcelApi 1.1",
  "Excel.ChartAxis.title": "ExcelApi 1.1",
  "Excel.ChartAxisTitle.text": "ExcelApi 1.1",
  "Excel.ChartLegend.visible": "ExcelApi 1.1",
  "Office.Document.addHandlerAsync": "DocumentEvents",
  "Office.Document.removeHandlerAsync": "DocumentEvents",
  "Office.OfficeTheme.bodyBackgroundColor": "-",
  "Excel.Range.rowCount": "ExcelApi 1.1",
  "Excel.Range.columnCount": "ExcelApi 1.1",
  "Excel.Worksheet.getUsedRangeOrNullObject": "ExcelApi 1.4",
  "Excel.Worksheet.name": "ExcelApi 1.1",
  "Excel.WorksheetCollection.items": "-",
  "Excel.WorksheetCollection.load": "-",
  "Office.AsyncResult.error": "-",
  "Office.AsyncResult.status": "-",
  "Office.Error.message": "-",
  // The Common API set "Settings" (version 1.1, as every Common set unless stated otherwise:
  // https://learn.microsoft.com/javascript/api/requirement-sets/common/office-add-in-requirement-sets).
  "Office.Settings.get": "Settings",
  "Office.Settings.set": "Settings",
  "Office.Settings.saveAsync": "Settings",
};

interface Use {
  api: string;
  set: string;
  /** The method of OfficeHost the use sits in. */
  method: string;
  text: string;
}

function setOf(declaration: ts.Declaration): string {
  const file = declaration.getSourceFile();
  const comments = ts.getLeadingCommentRanges(file.text, declaration.pos) ?? [];
  const text = comments.map((c) => file.text.slice(c.pos, c.end)).join("\n");
  const excel = /\[Api set: (ExcelApi) ([\d.]+)/.exec(text);
  if (excel) return `${excel[1]} ${excel[2]}`;
  const common = /Requirement set\*\*: \{@link [^|]+\| ([^}]+)\}/.exec(text);
  if (common) return common[1].trim() === "Not in a set" ? "-" : common[1].trim();
  return "-";
}

function qualifiedName(declaration: ts.Declaration): string {
  const names: string[] = [];
  for (let node: ts.Node | undefined = declaration; node; node = node.parent) {
    const name = (node as { name?: ts.Node }).name;
    if (name && (ts.isIdentifier(name) || ts.isStringLiteral(name))) names.unshift(name.text);
  }
  return names.join(".");
}

function scan(): Use[] {
  const config = ts.readConfigFile(path.join(__dirname, "../../tsconfig.json"), ts.sys.readFile);
  const parsed = ts.parseJsonConfigFileContent(config.config, ts.sys, path.join(__dirname, "../.."));
  const program = ts.createProgram([SOURCE], { ...parsed.options, noEmit: true });
  const checker = program.getTypeChecker();
  const file = program.getSourceFile(SOURCE)!;
  const uses: Use[] = [];
  const visit = (node: ts.Node): void => {
    if (ts.isPropertyAccessExpression(node)) {
      let symbol = checker.getSymbolAtLocation(node.name);
      if (symbol && symbol.flags & ts.SymbolFlags.Alias) symbol = checker.getAliasedSymbol(symbol);
      const declaration = symbol?.declarations?.find((d) => /@types[\\/]office-js/.test(d.getSourceFile().fileName));
      if (declaration) {
        let method = "(top level)";
        for (let up: ts.Node | undefined = node; up; up = up.parent) {
          if ((ts.isMethodDeclaration(up) || ts.isConstructorDeclaration(up)) && up.parent && ts.isClassDeclaration(up.parent)) {
            method = ts.isConstructorDeclaration(up) ? "constructor" : up.name.getText();
            break;
          }
        }
        uses.push({ api: qualifiedName(declaration), set: setOf(declaration), method, text: node.getText() });
      }
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return uses;
}

/** The optional features a method of officeHost.ts checks (`this.need(OPTIONAL.x)` or `this.has(OPTIONAL.x)`). */
function guardsOf(method: string, source: string): string[] {
  const start = source.search(new RegExp(`\\n {2}(?:async |private |private async )?${method}\\(`));
  if (start < 0) return [];
  const rest = source.slice(start + 1);
  const end = rest.search(/\n {2}(?:async |private |private async )?\w+\(/);
  const body = end < 0 ? rest : rest.slice(0, end);
  return [...body.matchAll(/this\.(?:need|has)\(OPTIONAL\.(\w+)\)/g)].map((m) => m[1]);
}

describe("requirement sets of the Office host adapter", () => {
  const uses = scan();
  const source = fs.readFileSync(SOURCE, "utf8");

  it("finds the adapter's API calls (the scan itself works)", () => {
    const apis = new Set(uses.map((u) => u.api));
    for (const api of ["Excel.Workbook.getSelectedRange", "Excel.Range.getSpillingToRangeOrNullObject", "Excel.ChartSeries.setXAxisValues", "Office.Document.addHandlerAsync"]) expect(apis).toContain(api);
  });

  it("every API used is listed here with the set its reference declares", () => {
    const found = Object.fromEntries([...new Map(uses.map((u) => [u.api, u.set])).entries()].sort());
    expect(found).toEqual(Object.fromEntries(Object.entries(USED).sort()));
  });

  it("every use above the baseline is checked with isSetSupported in the method that makes it", () => {
    const unguarded: string[] = [];
    for (const use of uses) {
      const [name, version] = use.set.split(" ");
      if (use.set === "-" || name !== BASELINE.name || versionAtLeast(BASELINE.version, version)) continue;
      const guards = guardsOf(use.method, source).map((key) => OPTIONAL[key as keyof typeof OPTIONAL]);
      if (!guards.some((g) => g && g.name === name && versionAtLeast(g.version, version))) unguarded.push(`${use.text} (${use.set}) in ${use.method}`);
    }
    expect(unguarded).toEqual([]);
  });

  it("Common API sets used are checked: DocumentEvents at start-up (taskpane.ts), any other in the method that uses it", () => {
    const common = new Set(uses.map((u) => u.set).filter((s) => s !== "-" && !s.startsWith("ExcelApi")));
    expect([...common].sort()).toEqual([DOCUMENT_EVENTS.name, OPTIONAL.settings.name].sort());
    const taskpane = fs.readFileSync(path.join(__dirname, "../../src/pane/taskpane.ts"), "utf8");
    expect(taskpane).toMatch(/\[BASELINE, DOCUMENT_EVENTS\]\.find\(\(set\) => !supports\(set\.name, set\.version\)\)/);
    const unguarded = uses
      .filter((u) => u.set !== "-" && !u.set.startsWith("ExcelApi") && u.set !== DOCUMENT_EVENTS.name)
      .filter((u) => !guardsOf(u.method, source).some((key) => OPTIONAL[key as keyof typeof OPTIONAL]?.name === u.set))
      .map((u) => `${u.text} (${u.set}) in ${u.method}`);
    expect(unguarded).toEqual([]);
    expect(OPTIONAL.settings.version).toBe("1.1");
  });

  it("the optional features name the sets their APIs declare", () => {
    const highest = (apis: string[]) => apis.map((api) => USED[api].split(" ")[1]).reduce((a, b) => (versionAtLeast(a, b) ? a : b));
    expect(OPTIONAL.spill.version).toBe(highest(["Excel.Range.getSpillingToRangeOrNullObject", "Excel.Range.getSpillParentOrNullObject"]));
    expect(OPTIONAL.chartSeries.version).toBe(highest(["Excel.ChartSeries.setXAxisValues", "Excel.ChartSeries.setValues", "Excel.ChartSeriesCollection.add"]));
    const baselineApis = Object.entries(USED).filter(([, set]) => set.startsWith("ExcelApi") && !Object.values(OPTIONAL).some((o) => set === `${o.name} ${o.version}`));
    expect(BASELINE.version).toBe(highest(baselineApis.map(([api]) => api)));
  });
});
