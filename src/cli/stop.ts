/**
 * `npm run stop` (= `spanwise stop`): stops the development server `npm start` left running
 * (the process named in .spanwise/server.json, only while that process is alive) and removes
 * the sideload registration `npm start` made (sideload.ts), so the desktop host drops the
 * add-in on its next start. Safe to run twice: each part says when there is nothing to do.
 */
import fs from "fs";
import os from "os";
import path from "path";
import type { Io } from "./io";
import { applyUnsideload, unsideloadPlan } from "./sideload";

const ROOT = path.resolve(__dirname, "..", "..");
/** Where `npm start` keeps the running server's process id and port. */
export const SERVER_FILE = path.join(ROOT, ".spanwise", "server.json");

/** The recorded server, or null when there is none or the record is not ours. */
export function recordedServer(text: string | null): { pid: number; port: number } | null {
  if (text === null) return null;
  try {
    const record = JSON.parse(text) as { pid?: unknown; port?: unknown };
    if (Number.isInteger(record.pid) && (record.pid as number) > 1 && Number.isInteger(record.port)) return { pid: record.pid as number, port: record.port as number };
  } catch {
    // not a record of ours
  }
  return null;
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

async function stopServer(file: string): Promise<string> {
  const server = recordedServer(fs.existsSync(file) ? fs.readFileSync(file, "utf8") : null);
  if (!server) return "No development server recorded (nothing to stop).";
  if (!alive(server.pid)) {
    fs.rmSync(file, { force: true });
    return `The recorded server (process ${server.pid}) is no longer running.`;
  }
  process.kill(server.pid, "SIGTERM");
  for (let i = 0; i < 50 && alive(server.pid); i++) await new Promise((resolve) => setTimeout(resolve, 100));
  fs.rmSync(file, { force: true });
  return alive(server.pid) ? `Asked the server (process ${server.pid}) to stop; it is still running.` : `Stopped the development server on port ${server.port} (process ${server.pid}).`;
}

export async function stop(io: Io, serverFile = SERVER_FILE): Promise<number> {
  io.stdout.write(`${await stopServer(serverFile)}\n`);
  let line: string;
  try {
    const xml = fs.readFileSync(path.join(ROOT, "manifest.xml"), "utf8");
    line = applyUnsideload(unsideloadPlan(process.platform, os.homedir(), xml, fs.existsSync));
  } catch (error) {
    line = `Could not remove the sideload registration: ${error instanceof Error ? error.message : String(error)}`;
  }
  io.stdout.write(`${line}\n`);
  return 0;
}
