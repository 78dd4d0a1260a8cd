import fs from "fs";
import os from "os";
import path from "path";
import { applySideload, DEVELOPER_KEY, manifestId, sideloadPlan } from "../../src/cli/sideload";

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
});
