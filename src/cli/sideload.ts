/**
 * Sideloading into the desktop spreadsheet host, where one is installed, without extra
 * packages: on Windows the per-user developer registration (a value under
 * HKCU\Software\Microsoft\Office\16.0\WEF\Developer named by the add-in's Id, holding the
 * manifest's absolute path); on macOS a copy of the manifest in the host's `wef` folder.
 * Linux has no desktop host: nothing to do. The plan is pure; `applySideload` carries it out.
 */
import { execFileSync } from "child_process";
import fs from "fs";
import path from "path";

export type SideloadPlan =
  | { kind: "registry"; key: string; name: string; value: string }
  | { kind: "copy"; from: string; to: string }
  | { kind: "none"; reason: string };

export const DEVELOPER_KEY = "HKCU\\Software\\Microsoft\\Office\\16.0\\WEF\\Developer";

/** The host's container folder on macOS; its `Data/Documents/wef` holds sideloaded manifests. */
export const MAC_CONTAINER = path.join("Library", "Containers", "com.microsoft.Excel");

/** The add-in's Id from the manifest text. */
export function manifestId(manifestXml: string): string {
  const match = /<Id>\s*([0-9a-fA-F-]{36})\s*<\/Id>/.exec(manifestXml);
  if (!match) throw new Error("manifest.xml has no <Id> GUID");
  return match[1];
}

export function sideloadPlan(
  platform: string,
  home: string,
  manifestPath: string,
  manifestXml: string,
  exists: (file: string) => boolean,
): SideloadPlan {
  if (platform === "win32") {
    return { kind: "registry", key: DEVELOPER_KEY, name: manifestId(manifestXml), value: path.resolve(manifestPath) };
  }
  if (platform === "darwin") {
    const container = path.join(home, MAC_CONTAINER);
    if (!exists(container)) return { kind: "none", reason: "the desktop spreadsheet host is not installed for this user" };
    return { kind: "copy", from: manifestPath, to: path.join(container, "Data", "Documents", "wef", `spanwise-${manifestId(manifestXml)}.xml`) };
  }
  return { kind: "none", reason: `no desktop spreadsheet host on ${platform}` };
}

/** Carries out a plan; returns a line saying what was done. */
export function applySideload(plan: SideloadPlan): string {
  switch (plan.kind) {
    case "registry":
      execFileSync("reg", ["add", plan.key, "/v", plan.name, "/t", "REG_SZ", "/d", plan.value, "/f"], { stdio: "pipe" });
      return `Sideloaded: registered ${plan.value} for the desktop host (${plan.key}\\${plan.name}); restart the host and open Beam diagrams on the Home tab.`;
    case "copy":
      fs.mkdirSync(path.dirname(plan.to), { recursive: true });
      fs.copyFileSync(plan.from, plan.to);
      return `Sideloaded: copied manifest.xml to ${plan.to}; restart the host and find Spanwise under My Add-ins.`;
    case "none":
      return `Not sideloaded: ${plan.reason}. Open the workbench instead.`;
  }
}

export type UnsideloadPlan =
  | { kind: "registry"; key: string; name: string }
  | { kind: "remove"; file: string }
  | { kind: "none"; reason: string };

/** Undoing `sideloadPlan` for `npm run stop` (pure): the same registry value or copied file. */
export function unsideloadPlan(platform: string, home: string, manifestXml: string, exists: (file: string) => boolean): UnsideloadPlan {
  if (platform === "win32") return { kind: "registry", key: DEVELOPER_KEY, name: manifestId(manifestXml) };
  if (platform === "darwin") {
    const file = path.join(home, MAC_CONTAINER, "Data", "Documents", "wef", `spanwise-${manifestId(manifestXml)}.xml`);
    return exists(file) ? { kind: "remove", file } : { kind: "none", reason: "no sideloaded copy of the manifest" };
  }
  return { kind: "none", reason: `no desktop spreadsheet host on ${platform}` };
}

/** Carries out an unsideload plan; returns a line saying what was done. */
export function applyUnsideload(plan: UnsideloadPlan): string {
  switch (plan.kind) {
    case "registry":
      try {
        execFileSync("reg", ["delete", plan.key, "/v", plan.name, "/f"], { stdio: "pipe" });
        return `Removed the sideload registration ${plan.key}\\${plan.name}; restart the host to drop the add-in.`;
      } catch {
        return `No sideload registration to remove (${plan.key}\\${plan.name}).`;
      }
    case "remove":
      fs.rmSync(plan.file, { force: true });
      return `Removed the sideloaded manifest ${plan.file}; restart the host to drop the add-in.`;
    case "none":
      return `Nothing to unsideload: ${plan.reason}.`;
  }
}
