/**
 * A profile run of the growth benchmark's member at the spans limit through the sources:
 *   node --cpu-prof --cpu-prof-dir=/tmp/prof -r ./src/cli/bin/tsHook tests/bench/growthProfile.ts
 *   node tests/bench/summariseProfile.js /tmp/prof/<file>.cpuprofile 30 sheetMaxMoment
 */
import { sheetMaxMoment } from "../../src/sheet";
import { MAX_SPANS } from "../../src/sheet/lists";
import { growthMember } from "./row.bench";

const m = growthMember(MAX_SPANS);
let sink = 0;
for (let i = 0; i < 8; i++) sink += Number(sheetMaxMoment(m.spans, [["udl", 1 + i / 1000, "", "", "", ""], ...m.points], null, null, null)[0][0]);
console.log(`done (${sink.toFixed(0)})`);
