/**
 * manifest.xml checked offline: well-formed XML (the strict sax parser that office-addin-manifest
 * reads XML manifests with, plus a single root element), the custom-functions extension point as
 * the add-in needs it, and validation with xmllint against Microsoft's XSDs for the add-in-only
 * manifest (../shared/office-schemas, build/validate.js, the same check as `npm run validate`).
 * The built and production manifests are validated in tests/functions/production.test.ts.
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
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { findSchemas, validateManifest, MAIN_SCHEMA } = require("../../build/validate") as {
  findSchemas: () => string | null;
  validateManifest: (file: string) => { ok: boolean; output: string };
  MAIN_SCHEMA: string;
};

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

  test("the support page is a page of its own (support.html), not the functions' runtime page", () => {
    expect(byTag(doc, "SupportUrl")[0].getAttribute("DefaultValue")).toBe("https://localhost:3000/support.html");
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

  describe("schema validation with xmllint against Microsoft's XSDs (../shared/office-schemas)", () => {
    // The XSDs of the add-in-only manifest, from the Office Add-ins documentation repository
    // (../shared/office-schemas/README.md). The unified-JSON conversion that was checked here
    // before drops the custom functions, so it proved nothing about them.
    const work = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-manifest-"));
    afterAll(() => fs.rmSync(work, { recursive: true, force: true }));
    const variant = (name: string, text: string) => {
      const file = path.join(work, name);
      fs.writeFileSync(file, text);
      return file;
    };

    test("the schemas are found beside the repository", () => {
      expect(findSchemas()).not.toBeNull();
      expect(fs.existsSync(path.join(findSchemas() as string, MAIN_SCHEMA))).toBe(true);
    });

    test("manifest.xml validates", () => {
      expect(validateManifest(manifestPath)).toEqual({ ok: true, output: "" });
    });

    test.each([
      ["an unknown element", xml.replace("<Permissions>", "<Permission>x</Permission><Permissions>")],
      ["a wrong permission value", xml.replace("<Permissions>ReadWriteDocument<", "<Permissions>Everything<")],
      ["an extension point of an unknown type", xml.replace('xsi:type="CustomFunctions"', 'xsi:type="CustomFunctionz"')],
      ["a custom-functions point with an unknown child", xml.replace(/<Namespace resid="Functions.Namespace"\/>/, '<Namespace resid="Functions.Namespace"/><Runtime/>')],
      ["a Script without a SourceLocation", xml.replace(/<Script>\s*<SourceLocation resid="Functions.Script.Url"\/>\s*<\/Script>/, "<Script></Script>")],
      ["a missing Id", xml.replace(/<Id>[^<]*<\/Id>/, "")],
      ["elements out of order", xml.replace(/(<Version>[^<]*<\/Version>)(\s*)(<ProviderName>[^<]*<\/ProviderName>)/, "$3$2$1")],
    ])("control: %s is rejected", (_what, broken) => {
      expect(broken).not.toBe(xml);
      const result = validateManifest(variant("broken.xml", broken));
      expect(result.ok).toBe(false);
      expect(result.output).toMatch(/fails to validate|error/i);
    });

    test("npm run validate checks manifest.xml and exits 0, and exits 1 on a broken one", () => {
      const script = path.join(root, "build", "validate.js");
      expect(execFileSync(process.execPath, [script, manifestPath], { encoding: "utf8" })).toMatch(/valid against/);
      const broken = variant("broken-cli.xml", xml.replace("<Permissions>ReadWriteDocument<", "<Permissions>Everything<"));
      let status = 0;
      try {
        execFileSync(process.execPath, [script, broken], { stdio: "pipe" });
      } catch (e) {
        status = (e as { status: number }).status;
      }
      expect(status).toBe(1);
      const pkg = JSON.parse(fs.readFileSync(path.join(root, "package.json"), "utf8"));
      expect(pkg.scripts.validate).toBe("node build/validate.js");
    });
  });
});
