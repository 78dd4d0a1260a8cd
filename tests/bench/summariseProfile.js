#!/usr/bin/env node
/**
 * Summarises a V8 .cpuprofile (from node --cpu-prof): self time by function and by source file,
 * largest first. Usage: node tests/bench/summariseProfile.js file.cpuprofile [rows] [function]
 * With a function name, only samples inside calls of that function count (so set-up, the
 * compiler and the generator are left out); garbage collection is shown beside them.
 */
const fs = require("fs");
const path = require("path");

const [file, rowsArg, under] = process.argv.slice(2);
if (!file) {
  console.error("usage: summariseProfile.js file.cpuprofile [rows]");
  process.exit(1);
}
const limit = Number(rowsArg) || 25;
const profile = JSON.parse(fs.readFileSync(file, "utf8"));
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
const inside = new Set();
const mark = (node, on) => {
  const now = on || !under || node.callFrame.functionName === under;
  if (now) inside.add(node.id);
  for (const child of node.children || []) mark(byId.get(child), now);
};
mark(profile.nodes[0], false);
const self = new Map();
const gaps = profile.timeDeltas;
let gc = 0;
let all = 0;
profile.samples.forEach((id, i) => {
  const us = gaps[i] || 0;
  all += us;
  if (byId.get(id).callFrame.functionName === "(garbage collector)") gc += us;
  if (inside.has(id)) self.set(id, (self.get(id) || 0) + us);
});
if (under) console.log(`inside ${under}: ${((100 * [...self.values()].reduce((a, b) => a + b, 0)) / all).toFixed(1)}% of the run; garbage collection (not attributed to a caller): ${((100 * gc) / all).toFixed(1)}% of the run`);
const total = [...self.values()].reduce((a, b) => a + b, 0);
const byFunction = new Map();
const byFile = new Map();
for (const [id, us] of self) {
  const { callFrame } = byId.get(id);
  const where = callFrame.url ? path.relative(process.cwd(), callFrame.url.replace(/^file:\/\//, "")) : "(native)";
  const name = `${callFrame.functionName || "(anonymous)"} ${where}:${callFrame.lineNumber + 1}`;
  byFunction.set(name, (byFunction.get(name) || 0) + us);
  byFile.set(where, (byFile.get(where) || 0) + us);
}
const show = (title, map) => {
  console.log(`\n${title} (self time, ${(total / 1000).toFixed(0)} ms sampled)`);
  [...map.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, limit)
    .forEach(([name, us]) => console.log(`${((100 * us) / total).toFixed(1).padStart(5)}%  ${name}`));
};
show("by function", byFunction);
show("by file", byFile);
