/** The version (package.json), the commit (git, when this is a checkout) and the platform of this run. */
import { execFileSync } from "child_process";
import * as os from "os";
import * as path from "path";
import type { BuildInfo } from "../report/meta";

const ROOT = path.resolve(__dirname, "..", "..");

export function buildInfo(date = new Date()): BuildInfo {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const version = String((require(path.join(ROOT, "package.json")) as { version?: unknown }).version ?? "unknown");
  let commit = "unknown";
  try {
    const out = execFileSync("git", ["rev-parse", "HEAD"], { cwd: ROOT, stdio: ["ignore", "pipe", "ignore"], timeout: 5000 }).toString().trim();
    if (/^[0-9a-f]{40}$/.test(out)) commit = out;
    const dirty = execFileSync("git", ["status", "--porcelain", "--untracked-files=no"], { cwd: ROOT, stdio: ["ignore", "pipe", "ignore"], timeout: 5000 }).toString().trim();
    if (commit !== "unknown" && dirty) commit += " (with uncommitted changes)";
  } catch {
    commit = "unknown";
  }
  const platform = `${os.type()} ${os.release()} ${process.arch}, Node.js ${process.version}`;
  return { version, commit, platform, date: date.toISOString().replace(/\.\d{3}Z$/, "Z") };
}
