/**
 * A profile run of the per-row benchmark's work through the sources (TypeScript transpiled by
 * the project's hook, no name-keeping transform), so function names survive:
 *   node --cpu-prof --cpu-prof-dir=/tmp/prof -r ./src/cli/bin/tsHook tests/bench/rowProfile.ts
 *   node tests/bench/summariseProfile.js /tmp/prof/<file>.cpuprofile
 */
import { sheetMaxMoment } from "../../src/sheet";
import { rows } from "./row.bench";

let sink = 0;
for (let pass = 0; pass < 4; pass++) {
  for (const row of rows(5000 + pass, 20000)) sink += Number(sheetMaxMoment([[row.spansText]], [[row.loadsText]], null, null, null)[0][0]);
}
console.log(`done (${sink.toFixed(0)})`);
