/**
 * `npm start` (= `spanwise start`): makes or renews the development certificate in the
 * project-local, git-ignored .certs/ and, on Windows and macOS, trusts its CA for the current
 * user after asking (certificates.ts; never without a terminal); builds every page with webpack
 * in watch mode and serves dist/ over HTTPS on localhost. Where the desktop spreadsheet host
 * is installed (Windows, macOS) the add-in is sideloaded (sideload.ts); on every machine the
 * workbench address is printed. The server's process id is kept in .spanwise/server.json for
 * `npm run stop` (stop.ts).
 */
import { execFileSync } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import readline from "readline";
import webpack from "webpack";
import { applyCertificatePlan, certificatePlan, certPaths, currentState, generateInto, tightenKey } from "./certificates";
import type { Io } from "./io";
import { UsageError } from "./io";
import { applySideload, sideloadPlan } from "./sideload";
import { createStaticServer, listen } from "./staticServer";
import { SERVER_FILE } from "./stop";

const ROOT = path.resolve(__dirname, "..", "..");
export const CERT_DIR = path.join(ROOT, ".certs");

export interface StartOptions {
  port: number;
}

/** A person can answer at this terminal (not CI, not a pipe). */
function interactive(): boolean {
  return Boolean(process.stdin.isTTY && process.stdout.isTTY) && !process.env.CI;
}

function askYesNo(question: string): Promise<boolean> {
  const rl = readline.createInterface({ input: process.stdin, output: process.stdout });
  return new Promise((resolve) =>
    rl.question(`${question} [y/N] `, (answer) => {
      rl.close();
      resolve(/^\s*y(es)?\s*$/i.test(answer));
    }),
  );
}

/** Makes, renews and (after asking) trusts the development certificate; says what it did. */
export async function ensureCertificates(io: Io, dir = CERT_DIR): Promise<{ key: Buffer; cert: Buffer; ca: string }> {
  const paths = certPaths(dir);
  tightenKey(paths);
  const steps = certificatePlan(currentState(paths, process.platform, os.homedir(), interactive()), paths);
  await applyCertificatePlan(steps, {
    generate: () => generateInto(paths),
    run: (command) => execFileSync(command.command, command.args, { stdio: "inherit" }),
    ask: askYesNo,
    say: (line) => io.stderr.write(`spanwise: ${line}\n`),
  });
  return { key: fs.readFileSync(paths.key), cert: fs.readFileSync(paths.cert), ca: paths.ca };
}

function build(io: Io): Promise<{ close: (callback: () => void) => void }> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const configure = require(path.join(ROOT, "webpack.config.js")) as (env: unknown, argv: unknown) => webpack.Configuration[];
  const compiler = webpack(configure({}, { mode: "development" }));
  return new Promise((resolve, reject) => {
    let first = true;
    const watching = compiler.watch({ aggregateTimeout: 300 }, (error, stats) => {
      if (error) {
        if (first) reject(error);
        io.stderr.write(`spanwise: build failed: ${error.message}\n`);
        return;
      }
      const text = stats?.toString({ preset: "errors-warnings", colors: false }).trim();
      if (stats?.hasErrors()) io.stderr.write(`spanwise: build has errors:\n${text}\n`);
      else io.stderr.write(`spanwise: built dist/ (${first ? "watching for changes" : "rebuilt"})\n`);
      if (first) {
        first = false;
        resolve(watching as unknown as { close: (callback: () => void) => void });
      }
    });
  });
}

function hostNote(): string {
  const manifest = path.join(ROOT, "manifest.xml");
  let line: string;
  try {
    const plan = sideloadPlan(process.platform, os.homedir(), manifest, fs.readFileSync(manifest, "utf8"), fs.existsSync);
    line = applySideload(plan);
  } catch (error) {
    line = `Could not sideload (${error instanceof Error ? error.message : String(error)}): add manifest.xml through the host's add-in dialog.`;
  }
  return line;
}

export async function start(options: StartOptions, io: Io): Promise<number> {
  if (!Number.isInteger(options.port) || options.port < 0 || options.port > 65535) throw new UsageError(`--port must be a port number, not ${options.port}`);
  const tls = await ensureCertificates(io);
  io.stderr.write("spanwise: building the add-in and the workbench...\n");
  const watching = await build(io);
  const server = createStaticServer(path.join(ROOT, "dist"), tls);
  let port: number;
  try {
    port = await listen(server, options.port);
  } catch (error) {
    throw new UsageError(`cannot serve on port ${options.port}: ${error instanceof Error ? error.message : String(error)}`, 1);
  }
  io.stdout.write(
    [
      "",
      `Spanwise workbench: https://localhost:${port}/workbench.html`,
      `Add-in files:       https://localhost:${port}/functions.html, /functions.json, /manifest.xml`,
      `Development certificate: ${path.relative(ROOT, tls.ca)} (project-local)`,
      hostNote(),
      "Press Ctrl+C (or run `npm run stop` elsewhere) to stop.",
      "",
    ].join("\n"),
  );
  fs.mkdirSync(path.dirname(SERVER_FILE), { recursive: true });
  fs.writeFileSync(SERVER_FILE, JSON.stringify({ pid: process.pid, port }) + "\n");
  await new Promise<void>((resolve) => {
    process.once("SIGINT", resolve);
    process.once("SIGTERM", resolve);
  });
  server.close();
  server.closeAllConnections();
  await new Promise<void>((resolve) => watching.close(() => resolve()));
  try {
    if (JSON.parse(fs.readFileSync(SERVER_FILE, "utf8")).pid === process.pid) fs.rmSync(SERVER_FILE, { force: true });
  } catch {
    // already gone
  }
  return 0;
}
