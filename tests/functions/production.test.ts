/**
 * The production build (`npm run build -- --env base=https://host/path/`, build/hosting.js):
 * - the manifest names that origin only (no localhost URL left) and validates against the XSDs,
 *   as does the development manifest in dist/;
 * - the metadata's help URLs follow;
 * - the pages load office.js and the custom-functions runtime from the hosted location the
 *   documentation requires for published add-ins (https://appsforoffice.microsoft.com/lib/1/
 *   hosted/office.js: "Referencing the Office JavaScript API library", learn.microsoft.com/
 *   office/dev/add-ins/develop/referencing-the-javascript-api-for-office-library-from-its-cdn),
 *   with a policy allowing scripts from exactly that origin besides their own;
 * - no local office.js, no GPL workbench, no screenshots among the add-in's files.
 */
import * as fs from "fs";
import * as path from "path";
import { buildAddin } from "./build";

// eslint-disable-next-line @typescript-eslint/no-require-imports
const hosting = require("../../build/hosting") as {
  parseBase: (text: string) => { base: string; origin: string };
  hostedPage: (html: string, name: string) => string;
  rebaseText: (text: string, h: { base: string; origin: string }, what: string) => string;
  OFFICE_CDN: string;
};
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { validateManifest } = require("../../build/validate") as { validateManifest: (file: string) => { ok: boolean; output: string } };

const BASE = "https://addins.example.com/spanwise/";

function files(dir: string): string[] {
  return fs
    .readdirSync(dir, { recursive: true, encoding: "utf8" })
    .filter((f) => fs.statSync(path.join(dir, f)).isFile())
    .map((f) => f.split(path.sep).join("/"))
    .sort();
}

function policyOf(html: string): Map<string, string[]> {
  const policy = /<meta[^>]+http-equiv=["']?Content-Security-Policy["']?[^>]*content="([^"]+)"/i.exec(html)?.[1] ?? "";
  return new Map(policy.split(";").map((d) => d.trim().split(/\s+/)).filter((d) => d[0]).map((d) => [d[0], d.slice(1)] as [string, string[]]));
}

describe("the base URL", () => {
  test.each([
    ["http://addins.example.com/", /https/],
    ["https://addins.example.com/spanwise", /end with "\/"/],
    ["https://localhost:3000/", /loopback/],
    ["https://addins.example.com/?x=1", /query/],
    ["not a url", /absolute https URL/],
  ])("%s is refused", (base, message) => {
    expect(() => hosting.parseBase(base)).toThrow(message);
  });

  test("a plain https folder is taken, with its origin", () => {
    expect(hosting.parseBase(BASE)).toEqual({ base: BASE, origin: "https://addins.example.com" });
  });

  test("a hosted build writes no source maps (they would publish the whole source)", () => {
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    const config = require("../../webpack.config.js");
    expect(config.addinConfig({ base: BASE }, { mode: "production" }).devtool).toBe(false);
    expect(config.paneConfig({ base: BASE }, { mode: "production" }).devtool).toBe(false);
    expect(config.addinConfig({}, { mode: "production" }).devtool).toBe("source-map");
  });

  test("control: rebasing refuses to leave a localhost URL, and a page without the expected script tag", () => {
    expect(() => hosting.rebaseText('<a href="http://localhost:8080/x"/>', hosting.parseBase(BASE), "manifest.xml")).toThrow(/localhost URL is left/);
    expect(() => hosting.hostedPage('<script src="office-js/office_strings.js"></script>', "x.html")).toThrow(/local office-js/);
    expect(() => hosting.hostedPage('<script src="office-js/office.js"></script>', "x.html")).toThrow(/Content-Security-Policy/);
  });
});

describe("production build", () => {
  let out: string;
  let dev: string;
  beforeAll(async () => {
    dev = await buildAddin();
    out = await buildAddin({ base: BASE });
  }, 600_000);

  test("the manifest names the production origin only and validates against the XSDs; so does the development manifest", () => {
    const manifest = fs.readFileSync(path.join(out, "manifest.xml"), "utf8");
    expect(manifest).not.toMatch(/localhost|127\.0\.0\.1/);
    const urls = [...manifest.matchAll(/"(https?:\/\/[^"]+)"/g)].map((m) => m[1]).filter((u) => !u.startsWith("http://schemas.") && !u.startsWith("http://www.w3.org"));
    expect(urls.length).toBeGreaterThanOrEqual(10);
    for (const url of urls) expect(url.startsWith(BASE)).toBe(true);
    expect(/<AppDomain>([^<]+)<\/AppDomain>/.exec(manifest)?.[1]).toBe("https://addins.example.com");
    expect(/<SupportUrl DefaultValue="([^"]+)"/.exec(manifest)?.[1]).toBe(`${BASE}support.html`);
    expect(validateManifest(path.join(out, "manifest.xml"))).toEqual({ ok: true, output: "" });
    expect(validateManifest(path.join(dev, "manifest.xml"))).toEqual({ ok: true, output: "" });
  });

  test("every URL the manifest and metadata name is a file of the build", () => {
    const manifest = fs.readFileSync(path.join(out, "manifest.xml"), "utf8");
    const metadata = JSON.parse(fs.readFileSync(path.join(out, "functions.json"), "utf8"));
    const named = [...[...manifest.matchAll(/"(https:\/\/[^"]+)"/g)].map((m) => m[1]), ...metadata.functions.map((f: { helpUrl: string }) => f.helpUrl)].filter((u) => u.startsWith(BASE));
    expect(metadata.functions.every((f: { helpUrl: string }) => f.helpUrl.startsWith(`${BASE}help/`))).toBe(true);
    for (const url of named) expect(fs.existsSync(path.join(out, url.slice(BASE.length)))).toBe(true);
  });

  test("the pages load the Office library from its hosted location, allowed by exactly that origin", () => {
    const cdnOrigin = new URL(hosting.OFFICE_CDN).origin;
    expect(hosting.OFFICE_CDN).toBe("https://appsforoffice.microsoft.com/lib/1/hosted/");
    const functionsPage = fs.readFileSync(path.join(out, "functions.html"), "utf8");
    const panePage = fs.readFileSync(path.join(out, "taskpane.html"), "utf8");
    expect(functionsPage).toContain(`src="${hosting.OFFICE_CDN}custom-functions-runtime.js"`);
    expect(panePage).toContain(`src="${hosting.OFFICE_CDN}office.js"`);
    for (const html of [functionsPage, panePage]) {
      const policy = policyOf(html);
      expect(policy.get("script-src")).toEqual(["'self'", cdnOrigin]);
      expect(policy.get("default-src")).toEqual(["'self'"]);
      const remote = [...policy.values()].flat().filter((s) => /^https?:/.test(s));
      expect(remote).toEqual([cdnOrigin]);
      expect(html).not.toMatch(/office-js\//);
    }
  });

  test("the add-in's files: no local office.js, no workbench, no screenshots", () => {
    const shipped = files(out).filter((f) => f !== ".complete");
    expect(shipped.filter((f) => /^office-js\//.test(f))).toEqual([]);
    expect(shipped.filter((f) => /workbench/i.test(f))).toEqual([]);
    expect(shipped.filter((f) => f.endsWith(".png") && !/^assets\/icon-\d+\.png$/.test(f))).toEqual([]);
    const allowed = /^(functions\.(js|json|html)|taskpane\.(js|html)|report-pdf\.js|manifest\.xml|support\.html|help\/[a-z]+\.html|assets\/icon-\d+\.png|[a-z-]+\.js\.LICENSE\.txt)$/;
    expect(shipped.filter((f) => !allowed.test(f))).toEqual([]);
    expect(fs.readFileSync(path.join(out, "functions.js"), "utf8")).not.toMatch(/hyperformula/i);
    expect(fs.readFileSync(path.join(out, "taskpane.js"), "utf8")).not.toMatch(/hyperformula/i);
  });
});
