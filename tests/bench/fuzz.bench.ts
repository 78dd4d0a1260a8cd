/**
 * Fuzz benchmark (reported, never asserted in jest): `node tests/bench/run.js fuzz`.
 * 1. At least 100,000 host-shaped garbage cases across every worksheet function (the jest
 *    suite's generators, more runs): violations of the contract counted, slowest call timed
 *    against the 50 ms budget.
 * 2. At least 100,000 valid random members: worst equilibrium residual of SPAN.REACTIONS
 *    against the loads (statics of tests/hardening/equilibrium.ts), budget 1e-9 of the load scale.
 */
import fc from "fast-check";
import { performance } from "perf_hooks";
import * as fx from "../../functions/functions";
import { argsOf, residuals, validMember } from "../hardening/equilibrium";
import { outcomeOf, violations } from "../hardening/outcome";
import { SPECS } from "../hardening/worksheetCases";

const CASES = Number(process.env.FUZZ_CASES ?? 100_000);
const MEMBERS = Number(process.env.FUZZ_MEMBERS ?? 100_000);

export function run(): void {
  const perFunction = Math.ceil(CASES / SPECS.length);
  let total = 0;
  let bad = 0;
  let slowest = { ms: 0, name: "", args: "" };
  for (const spec of SPECS) {
    let fnSlowest = 0;
    fc.assert(
      fc.property(spec.cases, (c) => {
        const start = performance.now();
        const outcome = outcomeOf(() => spec.call(c.args));
        const ms = performance.now() - start;
        total++;
        fnSlowest = Math.max(fnSlowest, ms);
        if (ms > slowest.ms) slowest = { ms, name: spec.name, args: JSON.stringify(c.args).slice(0, 160) };
        const problems = violations(outcome, spec.shape(c));
        if (problems.length > 0) {
          bad++;
          if (bad <= 5) console.log(`VIOLATION ${spec.name}: ${problems.join("; ")} ${JSON.stringify(c.args).slice(0, 300)}`);
        }
      }),
      { numRuns: perFunction, seed: 7 },
    );
    console.log(`${spec.name.padEnd(16)} ${perFunction} cases, slowest ${fnSlowest.toFixed(2)} ms`);
  }
  console.log(`fuzz: ${total} cases, ${bad} violations, slowest call ${slowest.ms.toFixed(2)} ms (${slowest.name} ${slowest.args})`);

  let solved = 0;
  let refused = 0;
  let worst = { residual: 0, args: "" };
  let slowestMember = 0;
  fc.assert(
    fc.property(validMember(), (m) => {
      const args = argsOf(m) as [any, any, any, any, any];
      const start = performance.now();
      const outcome = outcomeOf(() => fx.reactions(...args));
      slowestMember = Math.max(slowestMember, performance.now() - start);
      if (outcome.kind === "error") {
        refused++;
        return;
      }
      solved++;
      const r = residuals(m, outcome.value as number[][]);
      const residual = Math.max(r.force, r.moment);
      if (residual > worst.residual) worst = { residual, args: JSON.stringify(args).slice(0, 200) };
    }),
    { numRuns: MEMBERS, seed: 11 },
  );
  console.log(`equilibrium: ${MEMBERS} valid random members, ${solved} solved, ${refused} refused (mechanisms or beyond trust); worst residual ${worst.residual.toExponential(2)} of the load scale (budget 1e-9); slowest ${slowestMember.toFixed(2)} ms`);
  if (worst.residual > 1e-9) console.log(`worst member: ${worst.args}`);
}
