/**
 * The development certificate plan, per platform and state, without running anything (as
 * sideloading is tested), then carried out with fakes; generation and renewal for real in a
 * scratch folder. What the plan must do comes from office-addin-dev-certs (its README on npm:
 * installs the CA so localhost is trusted, replaces certificates that are no longer valid,
 * 30 days by default; its lib/install.js: CurrentUser Root store on Windows, `security
 * add-trusted-cert -d -r trustRoot -k ~/Library/Keychains/login.keychain-db` on macOS) and
 * from the hosts' refusal of an untrusted localhost ("content is blocked because it isn't
 * signed by a valid certificate", OfficeDev/office-js#2613).
 */
import fs from "fs";
import os from "os";
import path from "path";
import {
  applyCertificatePlan,
  certificatePlan,
  certPaths,
  currentState,
  generateInto,
  readCertificates,
  RENEW_DAYS,
  tightenKey,
  type CertState,
  type CertStep,
  type Command,
} from "../../src/cli/certificates";

const paths = certPaths("/p/.certs");
const NOW = new Date("2026-12-01T12:00:00Z");
const days = (n: number) => new Date(NOW.getTime() + n * 24 * 3600 * 1000);

function state(overrides: Partial<CertState>): CertState {
  return { platform: "win32", files: true, notAfter: days(20), now: NOW, trusted: true, thumbprint: "AB12", interactive: true, home: "/Users/e", ...overrides };
}

/** The steps flattened with the answer given (yes/no), as kinds and commands. */
function walk(steps: CertStep[], answer: boolean): string[] {
  return steps.flatMap((s): string[] => {
    if (s.kind === "ask") return ["ask", ...walk(answer ? s.ifYes : s.ifNo, answer)];
    if (s.kind === "run") return [`run ${s.command.command} ${s.command.args.join(" ")}`];
    return [s.kind];
  });
}

const WIN_TRUST = "run certutil -user -addstore Root /p/.certs/ca.crt";
const MAC_TRUST = "run security add-trusted-cert -d -r trustRoot -k /Users/e/Library/Keychains/login.keychain-db /p/.certs/ca.crt";

describe("the plan (pure)", () => {
  test.each([
    // platform, state, answer, steps
    ["win32: valid and trusted: nothing to do, says so", { platform: "win32" }, true, ["tell"]],
    ["win32: missing: generate, ask, trust", { platform: "win32", files: false, trusted: null, thumbprint: null }, true, ["generate", "ask", WIN_TRUST, "tell"]],
    ["win32: missing, the user declines: generate, ask, the manual command", { platform: "win32", files: false, trusted: null }, false, ["generate", "ask", "tell"]],
    ["win32: valid but not trusted: ask, trust", { platform: "win32", trusted: false }, true, ["ask", WIN_TRUST, "tell"]],
    [
      "win32: expiring within the renewal window and trusted: renew, remove the old CA by thumbprint, trust the new one",
      { platform: "win32", notAfter: days(RENEW_DAYS - 1) },
      true,
      ["generate", "ask", "run certutil -user -delstore Root AB12", WIN_TRUST, "tell"],
    ],
    ["win32: expired: renew", { platform: "win32", notAfter: days(-1) }, true, ["generate", "ask", "run certutil -user -delstore Root AB12", WIN_TRUST, "tell"]],
    ["win32: unreadable files: renew", { platform: "win32", notAfter: null, trusted: null }, true, ["generate", "ask", WIN_TRUST, "tell"]],
    ["win32: non-interactive (CI) never installs, says what to run", { platform: "win32", files: false, trusted: null, interactive: false }, true, ["generate", "tell", "tell"]],
    ["darwin: valid and trusted", { platform: "darwin" }, true, ["tell"]],
    ["darwin: missing: generate, ask, trust in the login keychain", { platform: "darwin", files: false, trusted: null }, true, ["generate", "ask", MAC_TRUST, "tell"]],
    [
      "darwin: expiring and trusted: renew, delete the old CA by SHA-1, trust the new one",
      { platform: "darwin", notAfter: days(2) },
      true,
      ["generate", "ask", "run security delete-certificate -Z AB12 /Users/e/Library/Keychains/login.keychain-db", MAC_TRUST, "tell"],
    ],
    ["darwin: non-interactive never installs", { platform: "darwin", trusted: false, interactive: false }, true, ["tell", "tell"]],
    ["linux: valid: says where it is and how to trust it in a browser, installs nothing", { platform: "linux", trusted: null }, true, ["tell", "tell"]],
    ["linux: missing: generate, then directions", { platform: "linux", files: false, trusted: null }, true, ["generate", "tell", "tell"]],
    ["linux: expiring: renew, then directions", { platform: "linux", notAfter: days(1), trusted: null }, true, ["generate", "tell", "tell"]],
  ] as [string, Partial<CertState>, boolean, string[]][])("%s", (_name, overrides, answer, expected) => {
    expect(walk(certificatePlan(state(overrides), paths), answer)).toEqual(expected);
  });

  test("a certificate with more than the renewal window left is kept (the boundary)", () => {
    expect(walk(certificatePlan(state({ notAfter: days(RENEW_DAYS + 0.01) }), paths), true)).toEqual(["tell"]);
    expect(walk(certificatePlan(state({ notAfter: days(RENEW_DAYS - 0.01) }), paths), true)[0]).toBe("generate");
  });

  test("what it says: the reason for a renewal, the expiry, the manual command, Linux browser directions", () => {
    const renew = certificatePlan(state({ notAfter: days(3) }), paths);
    expect(renew[0]).toEqual({ kind: "generate", reason: "the certificate expires on 2026-12-04, within 7 days" });
    const ci = certificatePlan(state({ files: false, trusted: null, interactive: false }), paths);
    const told = ci.filter((s) => s.kind === "tell").map((s) => (s as { text: string }).text);
    expect(told.join("\n")).toMatch(/not installed \(no terminal to ask/);
    expect(told.join("\n")).toContain("certutil -user -addstore Root /p/.certs/ca.crt");
    const linux = certificatePlan(state({ platform: "linux", trusted: null }), paths);
    const text = linux.map((s) => (s as { text: string }).text).join("\n");
    expect(text).toMatch(/Chromium\/Chrome: .*Authorities > Import \/p\/\.certs\/ca\.crt/);
    expect(text).toMatch(/Firefox: /);
    expect(text).toMatch(/valid until 2026-12-21/);
    const ask = certificatePlan(state({ trusted: false }), paths).find((s) => s.kind === "ask") as { question: string };
    expect(ask.question).toMatch(/Trusted Root store/);
  });
});

describe("carrying out a plan (fakes)", () => {
  function fakes(answer: boolean, fail = false) {
    const log: string[] = [];
    return {
      log,
      actions: {
        generate: async () => void log.push("generate"),
        run: (c: Command) => {
          log.push(`run ${c.command} ${c.args[1]}`);
          if (fail) throw new Error("access denied");
        },
        ask: async () => (log.push("ask"), answer),
        say: (line: string) => void log.push(`say ${line.slice(0, 24)}`),
      },
    };
  }

  test("yes: the commands run in order, each reported", async () => {
    const { log, actions } = fakes(true);
    await applyCertificatePlan(certificatePlan(state({ notAfter: days(1) }), paths), actions);
    expect(log.filter((l) => !l.startsWith("say"))).toEqual(["generate", "ask", "run certutil -delstore", "run certutil -addstore"]);
    expect(log).toContain("say Done: trust /p/.certs/ca");
  });

  test("no: nothing runs", async () => {
    const { log, actions } = fakes(false);
    await applyCertificatePlan(certificatePlan(state({ trusted: false }), paths), actions);
    expect(log.filter((l) => l.startsWith("run"))).toEqual([]);
    expect(log.some((l) => l.startsWith("say Not trusted"))).toBe(true);
  });

  test("a failing command is reported with what to run, and stops the plan", async () => {
    const { log, actions } = fakes(true, true);
    await applyCertificatePlan(certificatePlan(state({ trusted: false }), paths), actions);
    expect(log.filter((l) => l.startsWith("say Could not"))).toHaveLength(1);
    expect(log.some((l) => l.startsWith("say Development certificate: trusted"))).toBe(false);
  });
});

describe("generation and renewal (real files in a scratch folder)", () => {
  let dir: string;
  beforeAll(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-certs-"));
  });
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  test("the key is owner-only (0600) in an owner-only folder; the certificate covers localhost for 30 days", async () => {
    const p = certPaths(path.join(dir, ".certs"));
    await generateInto(p);
    expect(fs.statSync(p.key).mode & 0o777).toBe(0o600);
    expect(fs.statSync(p.dir).mode & 0o777).toBe(0o700);
    expect(fs.readdirSync(p.dir).sort()).toEqual(["ca.crt", "localhost.crt", "localhost.key"]);
    const { notAfter, thumbprint } = readCertificates(p);
    const left = (notAfter!.getTime() - Date.now()) / 86400000;
    expect(left).toBeGreaterThan(29);
    expect(left).toBeLessThan(31);
    expect(thumbprint).toMatch(/^[0-9A-F]{40}$/);
    const s = currentState(p, "linux", dir, false);
    expect([s.files, s.trusted]).toEqual([true, null]);
    expect(walk(certificatePlan(s, p), true)).toEqual(["tell", "tell"]);
    // 25 days later the same files are due for renewal, and renewing replaces the CA.
    const later = currentState(p, "linux", dir, false, new Date(Date.now() + 25 * 86400000));
    expect(walk(certificatePlan(later, p), true)[0]).toBe("generate");
    await generateInto(p);
    expect(readCertificates(p).thumbprint).not.toBe(thumbprint);
    expect(fs.statSync(p.key).mode & 0o777).toBe(0o600);
  }, 120_000);

  test("a key written readable by others is tightened to 0600", () => {
    const p = certPaths(path.join(dir, "loose"));
    fs.mkdirSync(p.dir, { recursive: true });
    fs.writeFileSync(p.key, "k", { mode: 0o644 });
    fs.chmodSync(p.key, 0o644);
    tightenKey(p);
    expect(fs.statSync(p.key).mode & 0o777).toBe(0o600);
  });

  test("a certificate that does not chain to the CA beside it is unreadable (so it is renewed)", async () => {
    const a = certPaths(path.join(dir, "a"));
    const b = certPaths(path.join(dir, "b"));
    await generateInto(a);
    await generateInto(b);
    fs.copyFileSync(b.ca, a.ca);
    expect(readCertificates(a)).toEqual({ notAfter: null, thumbprint: null });
  }, 120_000);
});
