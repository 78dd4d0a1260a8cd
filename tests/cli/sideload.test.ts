import fs from "fs";
import os from "os";
import path from "path";
import { applySideload, applyUnsideload, DEVELOPER_KEY, manifestId, sideloadPlan, unsideloadPlan } from "../../src/cli/sideload";

const root = path.resolve(__dirname, "../..");
const manifestPath = path.join(root, "manifest.xml");
const xml = fs.readFileSync(manifestPath, "utf8");

describe("sideloading into the desktop host", () => {
  it("reads the add-in's Id from the manifest", () => {
    expect(manifestId(xml)).toMatch(/^[0-9a-f-]{36}$/i);
    expect(() => manifestId("<OfficeApp/>")).toThrow(/no <Id>/);
  });

  it("Windows: the per-user developer registration, named by the Id, holding the manifest's absolute path", () => {
    expect(sideloadPlan("win32", "C:\\Users\\e", "manifest.xml", xml, () => false)).toEqual({
      kind: "registry",
      key: DEVELOPER_KEY,
      name: manifestId(xml),
      value: path.resolve("manifest.xml"),
    });
  });

  it("macOS: a copy in the host's wef folder when the host is installed, nothing otherwise", () => {
    const home = "/Users/e";
    const plan = sideloadPlan("darwin", home, manifestPath, xml, (p) => p === path.join(home, "Library/Containers/com.microsoft.Excel"));
    expect(plan).toEqual({ kind: "copy", from: manifestPath, to: path.join(home, "Library/Containers/com.microsoft.Excel/Data/Documents/wef", `spanwise-${manifestId(xml)}.xml`) });
    expect(sideloadPlan("darwin", home, manifestPath, xml, () => false).kind).toBe("none");
  });

  it("Linux: nothing to sideload, and applying says so", () => {
    const plan = sideloadPlan("linux", "/home/e", manifestPath, xml, () => true);
    expect(plan.kind).toBe("none");
    expect(applySideload(plan)).toMatch(/^Not sideloaded: no desktop spreadsheet host on linux/);
  });

  it("a copy plan writes the manifest where the host looks (in a scratch home)", () => {
    const home = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-home-"));
    try {
      fs.mkdirSync(path.join(home, "Library/Containers/com.microsoft.Excel"), { recursive: true });
      const plan = sideloadPlan("darwin", home, manifestPath, xml, fs.existsSync);
      expect(applySideload(plan)).toMatch(/^Sideloaded: copied manifest.xml/);
      if (plan.kind !== "copy") throw new Error("expected a copy plan");
      expect(fs.readFileSync(plan.to, "utf8")).toBe(xml);
    } finally {
      fs.rmSync(home, { recursive: true, force: true });
    }
  });

  it("stop undoes each platform's sideload: the same registry value, the same copied file", () => {
    expect(unsideloadPlan("win32", "C:\\Users\\e", xml, () => false)).toEqual({ kind: "registry", key: DEVELOPER_KEY, name: manifestId(xml) });
    const home = "/Users/e";
    const copy = sideloadPlan("darwin", home, manifestPath, xml, () => true);
    if (copy.kind !== "copy") throw new Error("expected a copy plan");
    expect(unsideloadPlan("darwin", home, xml, (f) => f === copy.to)).toEqual({ kind: "remove", file: copy.to });
    expect(unsideloadPlan("darwin", home, xml, () => false).kind).toBe("none");
    expect(applyUnsideload(unsideloadPlan("linux", "/home/e", xml, () => true))).toMatch(/^Nothing to unsideload: no desktop spreadsheet host on linux/);
  });

  it("a remove plan deletes the copy the sideload wrote (in a scratch home)", () => {
    const home = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-home-"));
    try {
      fs.mkdirSync(path.join(home, "Library/Containers/com.microsoft.Excel"), { recursive: true });
      const plan = sideloadPlan("darwin", home, manifestPath, xml, fs.existsSync);
      applySideload(plan);
      if (plan.kind !== "copy") throw new Error("expected a copy plan");
      expect(applyUnsideload(unsideloadPlan("darwin", home, xml, fs.existsSync))).toMatch(/^Removed the sideloaded manifest/);
      expect(fs.existsSync(plan.to)).toBe(false);
    } finally {
      fs.rmSync(home, { recursive: true, force: true });
    }
  });
});
