/**
 * Writes tests/core/stored/results.json: the current solver's readings of the fixed members
 * (members.ts). Run once, by hand, when the stored results are (re)made on purpose:
 *   node -r ./src/cli/bin/tsHook tests/core/stored/generate.ts
 * Members the solver refuses (unstable arrangements the generator happens to draw) are skipped;
 * their count is stored, and the test checks they are still refused.
 */
import * as fs from "fs";
import * as path from "path";
import { solve } from "../../../src/core";
import { encode, generator, randomMember, readings, storeMember } from "./members";

export const SEED = 20261202;
export const DRAWN = 2000;

function main(): void {
  const random = generator(SEED);
  const solved: [ReturnType<typeof storeMember>, string][] = [];
  const refused: ReturnType<typeof storeMember>[] = [];
  for (let i = 0; i < DRAWN; i++) {
    const member = randomMember(random);
    let values: number[];
    try {
      values = readings(member, solve(member));
    } catch {
      refused.push(storeMember(member));
      continue;
    }
    solved.push([storeMember(member), encode(values)]);
  }
  const file = path.join(__dirname, "results.json");
  const text = JSON.stringify({ seed: SEED, drawn: DRAWN, solved, refused });
  fs.writeFileSync(file, text.replace(/\],\[\[\[/g, "],\n[[["));
  console.log(`${solved.length} solved, ${refused.length} refused, ${(text.length / 1e6).toFixed(2)} MB`);
}

main();
