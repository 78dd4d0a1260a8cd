/** Prints the runtime dependency table for the README: `node tests/bench/run.js licences`. */
import { runtimeDependencies } from "../hardening/dependencies";

export async function run(): Promise<void> {
  console.log("| package | version | licence | why it ships |\n| --- | --- | --- | --- |");
  for (const d of await runtimeDependencies()) console.log(`| ${d.name} | ${d.version} | ${d.licence} | ${d.why} |`);
}
