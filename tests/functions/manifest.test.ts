/**
 * manifest.xml checked offline: well-formed XML (the strict sax parser that office-addin-manifest
 * reads XML manifests with, plus a single root element), the custom-functions extension point as the add-in
 * needs it, and the schema check of its unified-JSON conversion (office-addin-manifest-converter
 * then office-addin-manifest validate, which checks .json manifests against bundled schemas).
 */
import { execFileSync } from "child_process";
import * as fs from "fs";
import { createRequire } from "module";
import * as os from "os";
import * as path from "path";

const root = path.resolve(__dirname, "../..");
const manifestPath = path.join(root, "manifest.xml");
const converterDir = path.dirname(require.resolve("office-addin-manifest-converter/package.json"));
const load = createRequire(__filename);
const { DOMParser } = load(require.resolve("@xmldom/xmldom", { paths: [converterDir] }));
const bin = (name: string) => path.join(root, "node_modules", ".bin", name);

const manifestToolDir = path.dirname(require.resolve("office-addin-manifest/package.json"));
const xml2jsDir = path.dirname(require.resolve("xml2js/package.json", { paths: [manifestToolDir] }));
const sax = load(require.resolve("sax", { paths: [xml2jsDir] }));

/** Throws unless the text is well-formed XML with exactly one root element. */
function checkWellFormed(xml: string): void {
  const parser = sax.parser(true);
  let depth = 0;
  let roots = 0;
  parser.onopentag = () => {
    if (depth === 0) roots++;
    depth++;
  };
  parser.onclosetag = () => depth--;
  parser.write(xml).close();
  if (roots !== 1) throw new Error(`expected one root element, found ${roots}`);
}

function parseStrict(xml: string): Document {
  checkWellFormed(xml);
  return new DOMParser().parseFromString(xml, "text/xml");
}

function byTag(doc: Document, tag: string): Element[] {
  return Array.from(doc.getElementsByTagName(tag));
}

describe("manifest.xml", () => {
  const xml = fs.readFileSync(manifestPath, "utf8");
  const doc = parseStrict(xml);
  const resources = new Map<string, string>();
  for (const tag of ["bt:Url", "bt:Image", "bt:String"]) {
    for (const el of byTag(doc, tag)) resources.set(el.getAttribute("id") ?? "", el.getAttribute("DefaultValue") ?? "");
  }

  test("is well-formed XML (and the check rejects broken XML: control)", () => {
    expect(doc.documentElement.tagName).toBe("OfficeApp");
    expect(() => parseStrict(xml.replace("</Hosts>", "</Host>"))).toThrow(/close tag/);
    expect(() => parseStrict(xml.replace('"TaskPaneApp"', "TaskPaneApp"))).toThrow(/Unquoted attribute/);
    expect(() => parseStrict(xml + "<OfficeApp/>")).toThrow(/one root element/);
  });

  test("declares the custom-functions extension point with namespace SPAN and the built files", () => {
    const point = byTag(doc, "ExtensionPoint").find((el) => el.getAttribute("xsi:type") === "CustomFunctions");
    expect(point).toBeDefined();
    const resid = (tag: string) => byTag(point as unknown as Document, tag)[0]?.getElementsByTagName("SourceLocation")[0]?.getAttribute("resid") ?? "";
    expect(resources.get(resid("Script"))).toBe("https://localhost:3000/functions.js");
    expect(resources.get(resid("Page"))).toBe("https://localhost:3000/functions.html");
    expect(resources.get(resid("Metadata"))).toBe("https://localhost:3000/functions.json");
    const namespace = byTag(point as unknown as Document, "Namespace")[0].getAttribute("resid") ?? "";
    expect(resources.get(namespace)).toBe("SPAN");
    const sets = byTag(doc, "Set").map((s) => s.getAttribute("Name"));
    expect(sets).toContain("CustomFunctionsRuntime");
  });

  test("asks for the least permission and uses only our own icons from assets/", () => {
    // ReadWriteDocument: the pane reads the member's ranges and writes diagram tables and
    // charts (with consent); nothing needs more (no mailbox, no document-level settings).
    expect(byTag(doc, "Permissions")[0].textContent).toBe("ReadWriteDocument");
    const icons = [
      ...byTag(doc, "IconUrl").map((e) => e.getAttribute("DefaultValue")),
      ...byTag(doc, "HighResolutionIconUrl").map((e) => e.getAttribute("DefaultValue")),
      ...byTag(doc, "bt:Image")
        .filter((e) => e.hasAttribute("DefaultValue"))
        .map((e) => e.getAttribute("DefaultValue")),
    ];
    expect(icons.length).toBeGreaterThanOrEqual(5);
    for (const url of icons) {
      const match = /^https:\/\/localhost:3000\/(assets\/icon-\d+\.png)$/.exec(url ?? "");
      expect(match).not.toBeNull();
      const png = fs.readFileSync(path.join(root, (match as RegExpExecArray)[1]));
      expect(png.subarray(1, 4).toString("ascii")).toBe("PNG");
    }
    expect(byTag(doc, "Id")[0].textContent).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/);
  });

  describe("conversion to the unified JSON manifest passes the offline schema check", () => {
    const work = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-manifest-"));
    let json = "";
    beforeAll(() => {
      fs.copyFileSync(manifestPath, path.join(work, "manifest.xml"));
      execFileSync(bin("office-addin-manifest-converter"), ["convert", "manifest.xml", "--output", "out"], { cwd: work, stdio: "pipe", timeout: 60000 });
      json = path.join(work, "out", "manifest.json");
    }, 90000);
    afterAll(() => fs.rmSync(work, { recursive: true, force: true }));

    const validate = (file: string) => {
      try {
        const output = execFileSync(bin("office-addin-manifest"), ["validate", file], { cwd: work, stdio: "pipe", timeout: 60000 }).toString();
        return { ok: !/error/i.test(output), output };
      } catch (e) {
        return { ok: false, output: String((e as { stdout?: Buffer }).stdout ?? e) };
      }
    };

    test("the converted manifest validates", () => {
      const manifest = JSON.parse(fs.readFileSync(json, "utf8"));
      expect(manifest.id).toBe(byTag(doc, "Id")[0].textContent);
      expect(validate(json)).toEqual({ ok: true, output: "" });
    }, 90000);

    test("the schema check rejects a broken manifest (control)", () => {
      const manifest = JSON.parse(fs.readFileSync(json, "utf8"));
      manifest.id = "not a guid";
      manifest.version = 7;
      const broken = path.join(work, "broken.json");
      fs.writeFileSync(broken, JSON.stringify(manifest));
      expect(validate(broken).ok).toBe(false);
    }, 90000);
  });
});
