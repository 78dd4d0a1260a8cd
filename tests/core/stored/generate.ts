/**
 * Writes tests/core/stored/results.json: the current solver's readings of the fixed members
 * (members.ts). Run once, by hand, when the stored results are (re)made on purpose:
 *   node -r ./src/cli/bin/tsHook tests/core/stored/generate.ts
 * Members the solver refuses (unstable arrangements the generator happens to draw) are skipped;
 * they are stored, and the test checks they are still refused. Members on which the solver's
 * rounding is large (mirrorDiscrepancy above MIRROR_LIMIT) are left out and counted.
 */
import * as fs from "fs";
import * as path from "path";
import { solve } from "../../../src/core";
import { encode, generator, mirrorDiscrepancy, randomMember, readings, storeMember } from "./members";

export const SEED = 20261202;
export const DRAWN = 2000;
export const MIRROR_LIMIT = 1e-13;

function main(): void {
  const random = generator(SEED);
  const solved: [ReturnType<typeof storeMember>, string][] = [];
  const refused: ReturnType<typeof storeMember>[] = [];
  let excluded = 0;
  for (let i = 0; i < DRAWN; i++) {
    const member = randomMember(random);
    let values: number[];
    try {
      const solution = solve(member);
      if (!(mirrorDiscrepancy(member, solution) <= MIRROR_LIMIT)) {
        excluded++;
        continue;
      }
      values = readings(member, solution);
    } catch {
      refused.push(storeMember(member));
      continue;
    }
    solved.push([storeMember(member), encode(values)]);
  }
  const file = path.join(__dirname, "results.json");
  const text = JSON.stringify({ seed: SEED, drawn: DRAWN, mirrorLimit: MIRROR_LIMIT, excluded, solved, refused });
  fs.writeFileSync(file, text.replace(/\],\[\[\[/g, "],\n[[["));
  console.log(`${solved.length} solved, ${refused.length} refused, ${excluded} left out (rounding), ${(text.length / 1e6).toFixed(2)} MB`);
}

main();
