/**
 * The generated custom-functions metadata lists the whole catalogue: straight from the
 * generator's API on functions/functions.ts, and as built into dist's functions.json.
 */
import { generateCustomFunctionsMetadata } from "custom-functions-metadata";
import * as fs from "fs";
import * as path from "path";
import * as vm from "vm";
import * as fx from "../../functions/functions";
import { buildAddin } from "./build";
import { CATALOGUE, catalogueMismatches, type MetadataFunction } from "./catalogue";

describe("metadata generator on functions/functions.ts", () => {
  let generated: Awaited<ReturnType<typeof generateCustomFunctionsMetadata>>;
  beforeAll(async () => {
    generated = await generateCustomFunctionsMetadata([path.resolve(__dirname, "../../functions/functions.ts")], true);
  });

  test("no errors, every catalogue function with the right parameters", () => {
    expect(generated.errors).toEqual([]);
    const functions = JSON.parse(generated.metadataJson).functions as MetadataFunction[];
    expect(catalogueMismatches(functions)).toEqual([]);
  });

  test("each id is associated with its JS export, and the export exists", () => {
    const pairs = generated.associate.map((a) => [a.id, a.functionName]).sort();
    expect(pairs).toEqual(CATALOGUE.map((c) => [c.id, c.exportName]).sort());
    for (const c of CATALOGUE) expect(typeof (fx as Record<string, unknown>)[c.exportName]).toBe("function");
  });

  test("the catalogue check catches a wrong optional flag (control)", () => {
    const functions = JSON.parse(generated.metadataJson).functions as MetadataFunction[];
    const broken = functions.map((f) => (f.id === "SHEAR" ? { ...f, parameters: f.parameters.map((p) => (p.name === "x" ? { ...p, optional: true } : p)) } : f));
    const before = catalogueMismatches(functions);
    const after = catalogueMismatches(broken);
    expect(after.filter((m) => !before.includes(m))).toEqual([expect.stringMatching(/^SHEAR: parameters /)]);
  });
});

describe("webpack production build", () => {
  let out: string;
  beforeAll(async () => {
    out = await buildAddin();
  }, 240000);

  test("functions.json is generated with the whole catalogue", () => {
    const json = JSON.parse(fs.readFileSync(path.join(out, "functions.json"), "utf8"));
    expect(catalogueMismatches(json.functions)).toEqual([]);
  });

  test("functions.js carries one generated associate call per function", () => {
    const js = fs.readFileSync(path.join(out, "functions.js"), "utf8");
    for (const c of CATALOGUE) expect(js).toContain(`CustomFunctions.associate("${c.id}"`);
    expect(js.match(/CustomFunctions\.associate\(/g)).toHaveLength(CATALOGUE.length);
  });

  test("functions.html loads the local runtime and the bundle; pages, icons, manifest and office.js are copied", () => {
    const html = fs.readFileSync(path.join(out, "functions.html"), "utf8");
    expect(html).toContain("office-js/custom-functions-runtime.js");
    expect(html).toMatch(/<script[^>]+functions\.js/);
    for (const file of ["taskpane.html", "manifest.xml", "assets/icon-16.png", "assets/icon-32.png", "assets/icon-64.png", "assets/icon-80.png", "office-js/office.js", "office-js/o15apptofilemappingtable.js", "office-js/custom-functions-runtime.js"]) {
      expect(fs.existsSync(path.join(out, file))).toBe(true);
    }
    expect(fs.readFileSync(path.join(out, "taskpane.html"), "utf8")).toMatch(/aid to a qualified engineer/);
  });

  test("office.js is copied unmodified (its licence allows only that)", () => {
    const officeDist = path.join(path.dirname(require.resolve("@microsoft/office-js/package.json")), "dist");
    for (const file of ["office.js", "custom-functions-runtime.js"]) {
      expect(fs.readFileSync(path.join(out, "office-js", file)).equals(fs.readFileSync(path.join(officeDist, file)))).toBe(true);
    }
  });

  test("the built bundle runs as the host runs it: associated functions answer, errors use the runtime's class", () => {
    class RuntimeError {
      constructor(
        readonly code: string,
        readonly message?: string,
      ) {}
    }
    const associated = new Map<string, (...args: unknown[]) => unknown>();
    const CustomFunctions = {
      associate: (id: string, fn: (...args: unknown[]) => unknown) => associated.set(id, fn),
      Error: RuntimeError,
      ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A" },
    };
    const context = vm.createContext({ CustomFunctions, console, self: {}, window: undefined });
    (context as { self: unknown }).self = context;
    vm.runInContext(fs.readFileSync(path.join(out, "functions.js"), "utf8"), context);
    for (const c of CATALOGUE) expect(associated.has(c.id)).toBe(true);
    const args = [[["4 6"]], [["udl 2 D; point 10 at 3 L"]], [[1, "", 7.5]], null, null, "1.2D+1.6L"];
    const built = associated.get("MOMENT")?.(...args);
    expect(built).toEqual(fx.moment(...(args as Parameters<typeof fx.moment>)));
    let thrown: unknown;
    try {
      associated.get("SLOPE")?.([[6]], [["udl 2"]], [[1]], null, null, null);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(RuntimeError);
    expect((thrown as RuntimeError).code).toBe("#N/A");
    expect((thrown as RuntimeError).message).toMatch(/slope needs EI/);
  });
});
