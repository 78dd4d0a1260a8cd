/**
 * The development certificate for https://localhost: a CA and a localhost certificate made by
 * office-addin-dev-certs' generator in the project's git-ignored .certs/ (30 days, as that
 * tool makes them), renewed RENEW_DAYS before expiry, and the CA trusted for the current user
 * where a desktop host runs, after asking.
 *
 * Why: the hosts refuse an untrusted localhost certificate ("Add-in content is blocked ...
 * not signed by a valid security certificate", OfficeDev/office-js#2613 and
 * office-js-docs-pr#1275), and then the SPAN functions never register. office-addin-dev-certs
 * ("Creates an SSL certificate for localhost signed by a developer CA certificate and installs
 * the developer CA certificate so that the certificates are trusted. If the certificates were
 * installed but are no longer valid, they will be replaced", npmjs.com/package/
 * office-addin-dev-certs; the commands in its lib/install.js) trusts the CA in the current
 * user's store: the CurrentUser Root store on Windows, the login keychain with
 * `security add-trusted-cert -d -r trustRoot` on macOS; on Linux it needs sudo and a system
 * store, which the web host in a browser does not read anyway, so here Linux gets directions.
 *
 * `certificatePlan` is pure (platform + state -> steps) and tested per platform without
 * running anything (tests/cli/certificates.test.ts); `applyCertificatePlan` carries the
 * steps out with an injected runner and question, so it is tested with fakes too.
 * Non-interactive runs (CI, no terminal) never install: they say what to run.
 */
import { execFileSync } from "child_process";
import { X509Certificate } from "crypto";
import fs from "fs";
import { isIP } from "net";
import path from "path";

/** Days a generated certificate lives (office-addin-dev-certs' default). */
export const VALID_DAYS = 30;
/** Renew when fewer days than this are left. */
export const RENEW_DAYS = 7;
/** The domains the localhost certificate covers. */
export const DOMAINS = ["localhost", "127.0.0.1"];

export interface CertPaths {
  dir: string;
  ca: string;
  cert: string;
  key: string;
}

export function certPaths(dir: string): CertPaths {
  return { dir, ca: path.join(dir, "ca.crt"), cert: path.join(dir, "localhost.crt"), key: path.join(dir, "localhost.key") };
}

export interface CertState {
  platform: string;
  /** CA, certificate and key all present. */
  files: boolean;
  /** The earlier expiry of the CA and the localhost certificate; null when unreadable. */
  notAfter: Date | null;
  now: Date;
  /** The current CA is trusted by the user's store; null where that cannot be told (Linux). */
  trusted: boolean | null;
  /** SHA-1 thumbprint of the current CA (hex, no colons), or null. */
  thumbprint: string | null;
  /** A person at a terminal can answer a question (stdin and stdout are terminals, not CI). */
  interactive: boolean;
  /** The user's home folder (macOS keychain path). */
  home: string;
}

export interface Command {
  command: string;
  args: string[];
}

export type CertStep =
  | { kind: "generate"; reason: string }
  | { kind: "ask"; question: string; ifYes: CertStep[]; ifNo: CertStep[] }
  | { kind: "run"; what: string; command: Command }
  | { kind: "tell"; text: string };

const DAY = 24 * 3600 * 1000;

function day(date: Date): string {
  return date.toISOString().slice(0, 10);
}

/** The command that makes the user's store trust the CA (the same stores office-addin-dev-certs uses). */
export function trustCommand(platform: string, paths: CertPaths, home: string): Command | null {
  if (platform === "win32") return { command: "certutil", args: ["-user", "-addstore", "Root", paths.ca] };
  if (platform === "darwin") return { command: "security", args: ["add-trusted-cert", "-d", "-r", "trustRoot", "-k", path.join(home, "Library", "Keychains", "login.keychain-db"), paths.ca] };
  return null;
}

/** The command that removes a CA, by its SHA-1 thumbprint, from the same store. */
export function untrustCommand(platform: string, thumbprint: string, home: string): Command | null {
  if (platform === "win32") return { command: "certutil", args: ["-user", "-delstore", "Root", thumbprint] };
  if (platform === "darwin") return { command: "security", args: ["delete-certificate", "-Z", thumbprint, path.join(home, "Library", "Keychains", "login.keychain-db")] };
  return null;
}

/** How to trust the CA in a browser on Linux, for the web host (nothing is installed). */
export function linuxDirections(paths: CertPaths): string {
  return [
    `To use the add-in in the spreadsheet host on the web from this machine, your browser must trust ${paths.ca} (nothing was installed: that needs your consent in the browser):`,
    `  Chromium/Chrome: Settings > Privacy and security > Security > Manage certificates > Authorities > Import ${paths.ca}, tick "Trust this certificate for identifying websites";`,
    `    or with NSS tools (apt-get install libnss3-tools): certutil -d sql:$HOME/.pki/nssdb -A -t "C,," -n "Spanwise development CA" -i ${paths.ca}`,
    `  Firefox: Settings > Privacy & Security > Certificates > View Certificates > Authorities > Import ${paths.ca}, tick "Trust this CA to identify websites".`,
    `Then open https://localhost:<port>/functions.html once: it must load without a warning. The CA is replaced ${RENEW_DAYS} days before it expires; import the new one then.`,
  ].join("\n");
}

function quote(command: Command): string {
  return [command.command, ...command.args.map((a) => (/[\s"']/.test(a) ? `"${a}"` : a))].join(" ");
}

/** The steps for a platform and state (pure). */
export function certificatePlan(state: CertState, paths: CertPaths): CertStep[] {
  const steps: CertStep[] = [];
  let reason = "";
  if (!state.files) reason = `none in ${paths.dir}`;
  else if (!state.notAfter) reason = "the existing files cannot be read";
  else if (state.notAfter.getTime() <= state.now.getTime()) reason = `the certificate expired on ${day(state.notAfter)}`;
  else if (state.notAfter.getTime() - state.now.getTime() < RENEW_DAYS * DAY) reason = `the certificate expires on ${day(state.notAfter)}, within ${RENEW_DAYS} days`;
  const renewing = reason !== "";
  if (renewing) steps.push({ kind: "generate", reason });
  const validUntil = renewing ? new Date(state.now.getTime() + VALID_DAYS * DAY) : (state.notAfter as Date);
  const trust = trustCommand(state.platform, paths, state.home);
  if (!trust) {
    steps.push({ kind: "tell", text: `Development certificate: ${paths.ca}, valid until ${day(validUntil)}${renewing ? " (new)" : ""}.` });
    steps.push({ kind: "tell", text: linuxDirections(paths) });
    return steps;
  }
  const trusted = renewing ? false : state.trusted === true;
  if (trusted) {
    steps.push({ kind: "tell", text: `Development certificate: trusted for this user, valid until ${day(validUntil)}.` });
    return steps;
  }
  // Replacing a CA this user trusted: remove the old one from the same store, by thumbprint only.
  const old = renewing && state.trusted === true && state.thumbprint ? untrustCommand(state.platform, state.thumbprint, state.home) : null;
  const commands: CertStep[] = [
    ...(old ? [{ kind: "run" as const, what: `remove the replaced development CA (${state.thumbprint})`, command: old }] : []),
    { kind: "run", what: `trust ${paths.ca} for this user`, command: trust },
  ];
  const manual = `Not trusted: the desktop host will block the add-in ("content is blocked ... not signed by a valid security certificate") until you run: ${commands
    .map((c) => (c.kind === "run" ? quote(c.command) : ""))
    .filter(Boolean)
    .join(" && ")}`;
  const store = state.platform === "win32" ? "your Windows user's Trusted Root store (Windows will ask you to confirm)" : "your login keychain (macOS will ask for your password)";
  if (!state.interactive) {
    steps.push({ kind: "tell", text: `Development certificate${renewing ? " made" : ""}: ${paths.ca}, valid until ${day(validUntil)}; not installed (no terminal to ask: CI or a pipe).` });
    steps.push({ kind: "tell", text: manual });
    return steps;
  }
  steps.push({
    kind: "ask",
    question: `The spreadsheet host loads the add-in only from a trusted https://localhost. Add the Spanwise development CA (${paths.ca}, valid until ${day(validUntil)}, for localhost only) to ${store}?`,
    ifYes: [...commands, { kind: "tell", text: `Development certificate: trusted for this user, valid until ${day(validUntil)}; renewed ${RENEW_DAYS} days before expiry.` }],
    ifNo: [{ kind: "tell", text: manual }],
  });
  return steps;
}

export interface CertActions {
  generate: () => Promise<void>;
  run: (command: Command) => void;
  ask: (question: string) => Promise<boolean>;
  say: (line: string) => void;
}

/** Carries out the steps; a failed command is reported with the manual command, never thrown. */
export async function applyCertificatePlan(steps: CertStep[], actions: CertActions): Promise<void> {
  for (const step of steps) {
    switch (step.kind) {
      case "generate":
        actions.say(`Making a development certificate (${step.reason}).`);
        await actions.generate();
        break;
      case "tell":
        actions.say(step.text);
        break;
      case "run":
        try {
          actions.run(step.command);
          actions.say(`Done: ${step.what}.`);
        } catch (error) {
          actions.say(`Could not ${step.what} (${error instanceof Error ? error.message.split("\n")[0] : String(error)}); run it yourself: ${quote(step.command)}`);
          return;
        }
        break;
      case "ask":
        await applyCertificatePlan((await actions.ask(step.question)) ? step.ifYes : step.ifNo, actions);
        break;
    }
  }
}

// ---- the machine's side: state, generation, trust check ----

/** The earlier expiry of the CA and the certificate, and the CA's thumbprint; nulls when unreadable. */
export function readCertificates(paths: CertPaths): { notAfter: Date | null; thumbprint: string | null } {
  try {
    const ca = new X509Certificate(fs.readFileSync(paths.ca));
    const cert = new X509Certificate(fs.readFileSync(paths.cert));
    const covers = (domain: string) => (isIP(domain) ? cert.checkIP(domain) : cert.checkHost(domain)) !== undefined;
    if (!cert.checkIssued(ca) || !cert.verify(ca.publicKey) || !DOMAINS.every(covers)) return { notAfter: null, thumbprint: null };
    const notAfter = new Date(Math.min(Date.parse(ca.validTo), Date.parse(cert.validTo)));
    return { notAfter: Number.isNaN(notAfter.getTime()) ? null : notAfter, thumbprint: ca.fingerprint.replace(/:/g, "") };
  } catch {
    return { notAfter: null, thumbprint: null };
  }
}

/** Whether the user's store trusts the CA (Windows, macOS); null elsewhere or when it cannot be told. */
export function isTrusted(platform: string, paths: CertPaths, thumbprint: string | null): boolean | null {
  try {
    if (platform === "win32" && thumbprint) {
      execFileSync("certutil", ["-user", "-verifystore", "Root", thumbprint], { stdio: "pipe" });
      return true;
    }
    if (platform === "darwin") {
      execFileSync("security", ["verify-cert", "-c", paths.cert, "-p", "ssl", "-s", "localhost"], { stdio: "pipe" });
      return true;
    }
    return null;
  } catch {
    return false;
  }
}

/**
 * Makes a new CA and certificate in a private temporary folder beside the old ones, then
 * moves them into place: the folder is the owner's only (0700) and the key is 0600 from the
 * start, never readable by others (issue 14).
 */
export async function generateInto(paths: CertPaths): Promise<void> {
  fs.mkdirSync(paths.dir, { recursive: true, mode: 0o700 });
  fs.chmodSync(paths.dir, 0o700);
  const work = fs.mkdtempSync(path.join(paths.dir, "new-"));
  fs.chmodSync(work, 0o700);
  try {
    const fresh = certPaths(work);
    const { generateCertificates } = await import("office-addin-dev-certs");
    await generateCertificates(fresh.ca, fresh.cert, fresh.key, VALID_DAYS, DOMAINS);
    fs.chmodSync(fresh.key, 0o600);
    for (const name of ["key", "cert", "ca"] as const) fs.renameSync(fresh[name], paths[name]);
  } finally {
    fs.rmSync(work, { recursive: true, force: true });
  }
}

/** Keeps the key owner-only even when an older run wrote it wider. */
export function tightenKey(paths: CertPaths): void {
  if (fs.existsSync(paths.key) && (fs.statSync(paths.key).mode & 0o077) !== 0) fs.chmodSync(paths.key, 0o600);
}

/** The state of this machine for the plan. */
export function currentState(paths: CertPaths, platform: string, home: string, interactive: boolean, now = new Date()): CertState {
  const files = [paths.ca, paths.cert, paths.key].every((f) => fs.existsSync(f));
  const { notAfter, thumbprint } = files ? readCertificates(paths) : { notAfter: null, thumbprint: null };
  const trusted = files && notAfter ? isTrusted(platform, paths, thumbprint) : null;
  return { platform, files, notAfter, now, trusted, thumbprint, interactive, home };
}
