/**
 * `npm start` (= `spanwise start`): makes a development certificate in the project-local,
 * git-ignored .certs/ (never installed into a system store), builds every page with webpack
 * in watch mode, and serves dist/ over HTTPS on localhost. Where the desktop spreadsheet host
 * is installed (Windows, macOS) the add-in is sideloaded (sideload.ts); on every machine the
 * workbench address is printed.
 */
import fs from "fs";
import os from "os";
import path from "path";
import { generateCertificates } from "office-addin-dev-certs";
import webpack from "webpack";
import type { Io } from "./io";
import { UsageError } from "./io";
import { applySideload, sideloadPlan } from "./sideload";
import { createStaticServer, listen } from "./staticServer";

const ROOT = path.resolve(__dirname, "..", "..");
export const CERT_DIR = path.join(ROOT, ".certs");

export interface StartOptions {
  port: number;
}

export async function ensureCertificates(dir = CERT_DIR): Promise<{ key: Buffer; cert: Buffer; ca: string }> {
  const ca = path.join(dir, "ca.crt");
  const cert = path.join(dir, "localhost.crt");
  const key = path.join(dir, "localhost.key");
  if (![ca, cert, key].every((file) => fs.existsSync(file))) {
    await generateCertificates(ca, cert, key, 30, ["localhost", "127.0.0.1"]);
  }
  return { key: fs.readFileSync(key), cert: fs.readFileSync(cert), ca };
}

function build(io: Io): Promise<unknown> {
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
        resolve(watching);
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
  if (process.platform !== "win32" && process.platform !== "darwin") return line;
  return `${line}\nThe host must trust .certs/ca.crt for https://localhost (install it in the user's certificate store).`;
}

export async function start(options: StartOptions, io: Io): Promise<number> {
  if (!Number.isInteger(options.port) || options.port < 0 || options.port > 65535) throw new UsageError(`--port must be a port number, not ${options.port}`);
  const tls = await ensureCertificates();
  io.stderr.write("spanwise: building the add-in and the workbench...\n");
  await build(io);
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
      `Development certificate: ${path.relative(ROOT, tls.ca)} (project-local; your browser will ask to trust it)`,
      hostNote(),
      "Press Ctrl+C to stop.",
      "",
    ].join("\n"),
  );
  await new Promise<void>((resolve) => {
    process.once("SIGINT", resolve);
    process.once("SIGTERM", resolve);
  });
  server.close();
  return 0;
}
