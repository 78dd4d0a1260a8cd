/**
 * Help the host shows, and the help pages the add-in serves (build/helpPages.js):
 * - every function description and parameter description in the built functions.json is at
 *   most 255 characters (the host's argument help is built for a line or two; truncation of
 *   long argument help in the Function Arguments window: OfficeDev/office-js#2063), and each
 *   description ends with an example;
 * - every function has a helpUrl ("helpUrl: URL that provides information about the function",
 *   "Manually create JSON metadata for custom functions", learn.microsoft.com/office/dev/
 *   add-ins/excel/custom-functions-json) naming a page the build contains, generated from the
 *   same JSDoc, with the full text, the syntax, every argument, the conventions, an example and
 *   the safety caution; the support page lists them all.
 */
import * as fs from "fs";
import * as path from "path";
import { buildAddin } from "./build";
import { CATALOGUE } from "./catalogue";

// eslint-disable-next-line @typescript-eslint/no-require-imports
const help = require("../../build/helpPages") as {
  HELP_LIMIT: number;
  CAUTION: string;
  CONVENTIONS: string[];
  readFunctionDocs: (source: string) => { id: string; description: string; remarks: string; helpUrl: string; params: { name: string; text: string }[] }[];
  helpFile: (id: string) => string;
  helpPage: (doc: unknown) => string;
  examplesIn: (text: string) => string[];
};
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { DEV_BASE } = require("../../build/hosting") as { DEV_BASE: string };

const root = path.resolve(__dirname, "../..");
const source = fs.readFileSync(path.join(root, "functions", "functions.ts"), "utf8");

interface MetadataFunction {
  id: string;
  description?: string;
  helpUrl?: string;
  parameters: { name: string; description?: string }[];
}

/** Every text of the metadata over the limit, by function and parameter. */
export function overLimit(functions: MetadataFunction[], limit = help.HELP_LIMIT): string[] {
  return functions.flatMap((f) => [
    ...((f.description ?? "").length > limit ? [`${f.id}: description ${f.description!.length}`] : []),
    ...f.parameters.filter((p) => (p.description ?? "").length > limit).map((p) => `${f.id} ${p.name}: ${p.description!.length}`),
  ]);
}

function strip(html: string): string {
  return html
    .replace(/<[^>]+>/g, " ")
    .replace(/&quot;/g, '"')
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ");
}

describe("help", () => {
  let out: string;
  let functions: MetadataFunction[];
  beforeAll(async () => {
    out = await buildAddin();
    functions = JSON.parse(fs.readFileSync(path.join(out, "functions.json"), "utf8")).functions;
  }, 300_000);

  test("no description or parameter description over 255 characters; each description ends with an example", () => {
    expect(functions).toHaveLength(CATALOGUE.length);
    expect(overLimit(functions)).toEqual([]);
    for (const f of functions) {
      expect(f.description).toMatch(new RegExp(`Example: =SPAN\\.${f.id}\\(.*\\)$`));
      for (const p of f.parameters) expect(p.description?.length ?? 0).toBeGreaterThan(10);
    }
  });

  test("control: the limit check names a long description and a long parameter", () => {
    const long = "x".repeat(256);
    const broken = functions.map((f) => (f.id === "MOMENT" ? { ...f, description: long, parameters: f.parameters.map((p, i) => (i === 0 ? { ...p, description: long } : p)) } : f));
    expect(overLimit(broken)).toEqual(["MOMENT: description 256", "MOMENT spans: 256"]);
  });

  test("every function has a helpUrl to its page, the page is in the build and carries the full text, syntax, arguments, conventions, an example and the caution", () => {
    const docs = help.readFunctionDocs(source);
    expect(docs.map((d) => d.id).sort()).toEqual(functions.map((f) => f.id).sort());
    for (const f of functions) {
      const file = help.helpFile(f.id);
      expect(f.helpUrl).toBe(DEV_BASE + file);
      const page = path.join(out, file);
      expect(fs.existsSync(page)).toBe(true);
      const html = fs.readFileSync(page, "utf8");
      const doc = docs.find((d) => d.id === f.id)!;
      expect(html).toBe(help.helpPage(doc)); // generated from the same JSDoc
      const body = strip(html);
      expect(body).toContain(help.CAUTION);
      expect(body).toContain(`SPAN.${f.id}`);
      expect(doc.remarks.length).toBeGreaterThan(doc.description.length / 2);
      expect(body).toContain(doc.remarks);
      for (const p of f.parameters) expect(body).toContain(p.name);
      for (const c of help.CONVENTIONS) expect(body).toContain(c);
      expect(help.examplesIn(f.description ?? "").length).toBeGreaterThan(0);
      for (const e of help.examplesIn(f.description ?? "")) expect(body).toContain(e);
      // A static page: no script may run in it.
      expect(html).toMatch(/Content-Security-Policy" content="default-src 'none';/);
      expect(html).not.toMatch(/<script/i);
    }
  });

  test("the support page links every help page and carries the caution", () => {
    const html = fs.readFileSync(path.join(out, "support.html"), "utf8");
    expect(strip(html)).toContain(help.CAUTION);
    for (const f of functions) expect(html).toContain(`href="${help.helpFile(f.id)}"`);
    expect(strip(html)).toMatch(/hover/);
  });
});
