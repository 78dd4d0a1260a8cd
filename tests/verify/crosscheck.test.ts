/**
 * The independent-reference cases (src/verify/cases/crosscheck.ts), the list `spanwise verify`
 * also writes into the verification document: every case's compared values agree with the
 * BigInt force method at 1e-9 of each quantity's own scale. The comparison can fail: a
 * solver whose moments are off by 1e-8 of their scale, or that drops a rotational spring,
 * fails cases.
 */
import { pieceList, pieceTableOf, solve, type Member } from "../../src/core";
import { crosscheckCases, handbookCases, verificationCases } from "../../src/verify/cases";
import { REFERENCE_SOURCE, SEEDED_COUNT } from "../../src/verify/cases/crosscheck";
import { runVerification } from "../../src/verify/run";
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import { verify } from "../../src/cli/verify";
import { escapeHtml } from "../../src/report/html";

const cases = crosscheckCases();

describe("independent-reference cases", () => {
  it("names distinct members, each with the reference as its source, the seeded ones included", () => {
    expect(new Set(cases.map((c) => c.name)).size).toBe(cases.length);
    expect(cases.filter((c) => c.name.includes("seeded member"))).toHaveLength(SEEDED_COUNT);
    for (const c of cases) expect(c.source).toBe(REFERENCE_SOURCE);
    expect(cases.some((c) => c.member.supports.some((s) => "rotational" in s && s.rotational !== undefined))).toBe(true);
    expect(cases.some((c) => c.member.supports.some((s) => s.kind === "hinge"))).toBe(true);
    expect(cases.some((c) => c.member.supports.some((s) => s.kind === "spring"))).toBe(true);
    expect(verificationCases()).toEqual([...handbookCases, ...cases]);
  });

  it.each(cases.map((c) => [c.name, c] as const))("%s", (_name, c) => {
    const result = runVerification([c]);
    const failed = result.cases[0].rows.filter((r) => !r.pass).map((r) => `${r.label}: got ${r.computed}, reference ${r.expected}`);
    expect({ error: result.cases[0].error, failed: failed.slice(0, 5) }).toEqual({ error: undefined, failed: [] });
    expect(result.cases[0].rows.length).toBeGreaterThan(20);
  });

  it("fails a solver whose moments are off by 1e-8 of their scale, or that drops rotational springs", () => {
    const nudged = (m: Member) => {
      const s = solve(m);
      return { ...s, pieces: pieceTableOf(pieceList(s.pieces).map((p) => ({ ...p, moment0: p.moment0 + 1e-8 * s.scales.moment }))) };
    };
    expect(runVerification(cases, nudged as typeof solve).pass).toBe(false);
    const stiff = cases.filter((c) => c.member.supports.some((s) => "rotational" in s && s.rotational !== undefined));
    const dropped = (m: Member) => solve({ ...m, supports: m.supports.map((s) => ("rotational" in s ? { ...s, rotational: undefined } : s)) });
    const result = runVerification(stiff, dropped);
    expect(result.cases.every((c) => !c.pass)).toBe(true);
  });
});

describe("spanwise verify writes them into the verification document", () => {
  it("lists every independent-reference case after the handbook cases, each passing, and exits 0", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-crosscheck-"));
    try {
      const out = path.join(dir, "verification.html");
      const written: string[] = [];
      const io = { stdout: { write: (t: string) => written.push(t) }, stderr: { write: (t: string) => written.push(t) } };
      expect(await verify({ out, force: false, info: { version: "0", commit: "c", platform: "p", date: "d" } }, io)).toBe(0);
      expect(written.join("")).toContain(`${handbookCases.length + cases.length} cases (${handbookCases.length} handbook, ${cases.length} independent-reference), 0 failed`);
      const html = fs.readFileSync(out, "utf8");
      cases.forEach((c, i) => expect(html).toContain(escapeHtml(`${handbookCases.length + i + 1}. ${c.name}: PASS`)));
      expect(html).toContain("BigInt fixed point");
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
