/**
 * The manifest's requirement sets cover every host API the functions call. The APIs are found,
 * not assumed: the built functions.js runs in a sandbox whose CustomFunctions global records
 * every member read, while each function is called once with good input and once with bad
 * input (the error path); the bundle is also scanned for any other host global. Each API
 * maps to its set as its reference page states:
 * - CustomFunctions.associate: CustomFunctionsRuntime 1.1 ("CustomFunctions namespace",
 *   learn.microsoft.com/javascript/api/custom-functions-runtime/customfunctions);
 * - CustomFunctions.Error: CustomFunctionsRuntime 1.2 ("CustomFunctions.Error class ...
 *   [API set: CustomFunctionsRuntime 1.2]", learn.microsoft.com/javascript/api/
 *   custom-functions-runtime/customfunctions.error);
 * - CustomFunctions.ErrorCode invalidValue and notAvailable: CustomFunctionsRuntime 1.2
 *   ("CustomFunctions.ErrorCode enum", learn.microsoft.com/javascript/api/
 *   custom-functions-runtime/customfunctions.errorcode; 1.3 adds further codes:
 *   "Custom Functions requirement sets", learn.microsoft.com/javascript/api/requirement-sets/
 *   excel/custom-functions-requirement-sets).
 * An API missing from the table fails the test until its set is added with its source.
 */
import { BASELINE, OPTIONAL } from "../../src/pane/requirements";
import * as fs from "fs";
import * as path from "path";
import * as vm from "vm";
import { buildAddin } from "./build";
import { CATALOGUE } from "./catalogue";

type SetVersion = { set: string; version: string };
const API_SETS: Record<string, SetVersion> = {
  "CustomFunctions.associate": { set: "CustomFunctionsRuntime", version: "1.1" },
  "CustomFunctions.Error": { set: "CustomFunctionsRuntime", version: "1.2" },
  "CustomFunctions.ErrorCode": { set: "CustomFunctionsRuntime", version: "1.2" },
  "CustomFunctions.ErrorCode.invalidValue": { set: "CustomFunctionsRuntime", version: "1.2" },
  "CustomFunctions.ErrorCode.notAvailable": { set: "CustomFunctionsRuntime", version: "1.2" },
};

const root = path.resolve(__dirname, "../..");

function versionAtLeast(have: string, need: string): boolean {
  const [a, b] = [have, need].map((v) => v.split(".").map(Number));
  for (let i = 0; i < Math.max(a.length, b.length); i++) if ((a[i] ?? 0) !== (b[i] ?? 0)) return (a[i] ?? 0) > (b[i] ?? 0);
  return true;
}

/** The sets a manifest declares, name -> MinVersion. */
function declaredSets(manifest: string): Map<string, string> {
  const sets = new Map<string, string>();
  const block = /<Requirements>([\s\S]*?)<\/Requirements>/.exec(manifest)?.[1] ?? "";
  const fallback = /<Sets[^>]*DefaultMinVersion="([^"]+)"/.exec(block)?.[1] ?? "1.1";
  for (const m of block.matchAll(/<Set\s+Name="([^"]+)"(?:\s+MinVersion="([^"]+)")?/g)) sets.set(m[1], m[2] ?? fallback);
  return sets;
}

/** What a manifest lacks for the given APIs. */
export function uncovered(apis: string[], manifest: string): string[] {
  const sets = declaredSets(manifest);
  return apis.flatMap((api) => {
    const need = API_SETS[api];
    if (!need) return [`${api}: not in the API table (add its requirement set with the reference page)`];
    const have = sets.get(need.set);
    return have && versionAtLeast(have, need.version) ? [] : [`${api} needs ${need.set} ${need.version}; the manifest declares ${have ?? "nothing"}`];
  });
}

/** Runs the bundle with a recording CustomFunctions and calls every function twice. */
function apisUsedBy(bundle: string): string[] {
  const used = new Set<string>();
  const record = <T extends object>(name: string, target: T): T =>
    new Proxy(target, {
      get(t, key) {
        if (typeof key === "string") used.add(`${name}.${key}`);
        const value = (t as Record<string | symbol, unknown>)[key];
        return value && typeof value === "object" ? record(`${name}.${String(key)}`, value as object) : value;
      },
    });
  class RuntimeError {
    constructor(
      readonly code: string,
      readonly message?: string,
    ) {}
  }
  const associated = new Map<string, (...args: unknown[]) => unknown>();
  const CustomFunctions = record("CustomFunctions", {
    associate: (id: string, fn: (...args: unknown[]) => unknown) => associated.set(id, fn),
    Error: RuntimeError,
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A" },
  });
  const context = vm.createContext({ CustomFunctions, console });
  vm.runInContext(bundle, context);
  for (const c of CATALOGUE) {
    const fn = associated.get(c.id);
    if (!fn) throw new Error(`${c.id} not associated`);
    for (const args of [c.parameters.map(() => [["6"]]), c.parameters.map(() => [["?"]])]) {
      try {
        fn(...args);
      } catch {
        // errors are the runtime's class: recorded through CustomFunctions.Error
      }
    }
  }
  // SLOPE without EI is #N/A: the second error code.
  try {
    associated.get("SLOPE")?.([[6]], [["udl 2"]], [[1]], null, null, null);
  } catch {
    // expected
  }
  return [...used].sort();
}

describe("requirement sets", () => {
  let bundle: string;
  beforeAll(async () => {
    bundle = fs.readFileSync(path.join(await buildAddin(), "functions.js"), "utf8");
  }, 300_000);

  test("the functions use exactly the custom-functions APIs of the table, and no other host global", () => {
    const apis = apisUsedBy(bundle);
    expect(apis).toEqual(expect.arrayContaining(["CustomFunctions.associate", "CustomFunctions.Error", "CustomFunctions.ErrorCode.invalidValue", "CustomFunctions.ErrorCode.notAvailable"]));
    expect(apis.filter((api) => !(api in API_SETS))).toEqual([]);
    expect(bundle.match(/\b(Office|Excel|OfficeRuntime)\.[A-Za-z]/g)).toBeNull();
  });

  test("manifest.xml declares a set covering each of them", () => {
    const manifest = fs.readFileSync(path.join(root, "manifest.xml"), "utf8");
    expect(uncovered(apisUsedBy(bundle), manifest)).toEqual([]);
  });

  test("manifest.xml declares the pane's baseline set, and none of its optional ones (those are checked at run time)", () => {
    // The pane assumes BASELINE everywhere (src/pane/requirements.ts) and checks OPTIONAL sets
    // with isSetSupported before use; declaring an optional set would keep the add-in from
    // loading on hosts where only that feature is missing. Requirements element: "Specify Office
    // applications and API requirements" (learn.microsoft.com/office/dev/add-ins/develop/specify-office-hosts-and-api-requirements).
    const manifest = fs.readFileSync(path.join(root, "manifest.xml"), "utf8");
    const declared = [...manifest.matchAll(/<Set Name="([^"]+)" MinVersion="([^"]+)"\/>/g)].map((m) => `${m[1]} ${m[2]}`);
    expect(declared).toContain(`${BASELINE.name} ${BASELINE.version}`);
    for (const feature of Object.values(OPTIONAL)) expect(declared).not.toContain(`${feature.name} ${feature.version}`);
  });

  test("control: the old manifest (CustomFunctionsRuntime 1.1) is refused, and an unknown API is named", () => {
    const manifest = fs.readFileSync(path.join(root, "manifest.xml"), "utf8").replace(/(Name="CustomFunctionsRuntime" MinVersion=")[^"]+"/, '$11.1"');
    expect(uncovered(apisUsedBy(bundle), manifest)).toEqual(expect.arrayContaining([expect.stringMatching(/^CustomFunctions\.Error needs CustomFunctionsRuntime 1\.2; the manifest declares 1\.1$/)]));
    expect(uncovered(["CustomFunctions.StreamingInvocation"], manifest)).toEqual([expect.stringMatching(/not in the API table/)]);
    expect(versionAtLeast("1.10", "1.2")).toBe(true);
    expect(versionAtLeast("1.1", "1.2")).toBe(false);
  });
});
