/**
 * Issue 15's six targets in one table: `npm run bench -- targets`, after
 * `npx webpack --mode production` (dist/functions.js) and with the command built
 * (`npm run build:cli`, done at install). Each measurement is the one its own bench makes,
 * run through that bench's code, each in a fresh Node process (so no part inherits another's
 * heap or compiled code), as users run the code:
 *
 * - per row, growth: row.bench.ts on the production bundle (`perRow`, `growth`);
 * - schedules: row.bench.ts counting solves with the member cache's counter (`scheduleRows`:
 *   the sources, since the bundle does not expose the counter; a count, not a time);
 * - arrangements: limits.bench.ts's issue 15 scenario (`arrangementsScenario`) on the
 *   production bundle, 20 timed repetitions after a warm-up;
 * - start-up: startup.bench.ts's pairs of the built command (`spanwise calc`, a one-cell
 *   workbook; a stale or missing build is an error) and `node -e 0` (STARTUP_RUNS pairs, 9 unless set);
 * - bundle: bundle.bench.ts, the size of dist/functions.js.
 *
 * Each part prints its bench's own lines and its `target ...` line; the table follows, with
 * the load average (as `uptime` prints it) at the start and the end. TARGETS_WRITE_README=1
 * also puts the table into README.md between its `<!-- issue-15-targets -->` markers, so the
 * README is refreshed by running this again. About a minute on an idle 2-core machine.
 */
import { spawnSync } from "child_process";
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import { DIST_FUNCTIONS, TARGETS_FILE_ENV, limitText, loadAverage, loadBundle, passes, ratioText, reportTarget, requireBuilt, type TargetResult } from "./measure";

const ROOT = path.resolve(__dirname, "..", "..");
const README = path.join(ROOT, "README.md");
const MARK = "<!-- issue-15-targets -->";
/** Repetitions of the arrangements call (the first a warm-up). */
const ARRANGEMENT_REPS = 21;

/**
 * The parts in the issue's order; each prints its target line(s) through reportTarget. Each
 * loads only its own bench, so its process holds what that bench's own process holds (one run
 * whose part processes had also loaded the limits bench and webpack gave a growth ratio of 11.7
 * against 13.6-16.4 in lean processes within minutes of it; not shown to be the cause, but the
 * row bench keeps its parts apart for the same reason).
 */
const PARTS: Record<string, () => void | Promise<void>> = {
  "per row": async () => (await import("./row.bench")).perRow(loadBundle()),
  schedules: async () => (await import("./row.bench")).scheduleRows(),
  growth: async () => (await import("./row.bench")).growth(loadBundle()),
  arrangements: async () => {
    const { arrangementsScenario, timeScenario } = await import("./limits.bench");
    const s = arrangementsScenario();
    reportTarget(s.target!(timeScenario(s, loadBundle(), ARRANGEMENT_REPS)));
  },
  "start-up": async () => {
    const { measureStartup, startupTarget } = await import("./startup.bench");
    reportTarget(startupTarget(await measureStartup(Number(process.env.STARTUP_RUNS ?? 9), 0)));
  },
  bundle: async () => reportTarget((await import("./bundle.bench")).bundleTarget()),
};

/** Refuses a bundle older than a source it is built from (it would measure code that is gone). */
function checkBundle(): void {
  requireBuilt();
  const built = fs.statSync(DIST_FUNCTIONS).mtimeMs;
  const newer: string[] = [];
  const walk = (dir: string): void => {
    for (const entry of fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true })) {
      const rel = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(rel);
      else if (fs.statSync(path.join(ROOT, rel)).mtimeMs > built) newer.push(rel);
    }
  };
  // Only what the functions bundle is made of (README, bundle paragraph: functions/, src/sheet,
  // src/core). The add-in build writes functions.js on every build (webpack.config.js
  // compareBeforeEmit), so a build after an edit, even one that changes no output, passes.
  for (const dir of ["functions", "src/sheet", "src/core"]) walk(dir);
  if (newer.length > 0) throw new Error(`dist/functions.js is older than ${newer.slice(0, 3).join(", ")}${newer.length > 3 ? ` and ${newer.length - 3} more` : ""}: run npx webpack --mode production first`);
}

function table(results: TargetResult[]): string[] {
  const cell = (text: string) => text.replace(/\|/g, "\\|");
  return [
    "| target | measured | ratio | limit | result |",
    "| --- | --- | --- | --- | --- |",
    ...results.map((t) => `| ${cell(t.target)} | ${cell(t.measured)} | ${ratioText(t.ratio)} ${cell(t.ratioOf)} | ${limitText(t)} | ${passes(t) ? "PASS" : "**MISS**"} |`),
  ];
}

/** Replaces the README's table between its two markers (the markers stay). */
function writeReadme(lines: string[]): void {
  const text = fs.readFileSync(README, "utf8");
  const first = text.indexOf(MARK);
  const second = text.indexOf(MARK, first + MARK.length);
  if (first < 0 || second < 0) throw new Error(`README.md has no pair of ${MARK} markers to write the table between`);
  fs.writeFileSync(README, `${text.slice(0, first + MARK.length)}\n${lines.join("\n")}\n${text.slice(second)}`);
  console.log(`README.md: the table between the ${MARK} markers rewritten`);
}

export async function run(): Promise<void> {
  const part = process.env.TARGETS_PART;
  if (part !== undefined) {
    await PARTS[part]();
    return;
  }
  checkBundle();
  const started = new Date();
  const loadStart = loadAverage();
  console.log(`node ${process.version}, ${os.cpus().length} cpus, load average at start ${loadStart}`);
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-targets-"));
  const file = path.join(dir, "targets.jsonl");
  try {
    for (const name of Object.keys(PARTS)) {
      console.log(`\n## ${name}`);
      const child = spawnSync(process.execPath, [path.join(__dirname, "run.js"), "targets.bench"], { cwd: ROOT, env: { ...process.env, TARGETS_PART: name, [TARGETS_FILE_ENV]: file }, encoding: "utf8" });
      // The runner's own "# file" header line is dropped; the part's lines are passed on.
      process.stdout.write(child.stdout.replace(/^\s*# targets\.bench\.ts\n/, ""));
      if (child.status !== 0) throw new Error(`targets part ${name} failed: ${child.stderr}`);
    }
    const results = fs
      .readFileSync(file, "utf8")
      .split("\n")
      .filter((line) => line.length > 0)
      .map((line) => JSON.parse(line) as TargetResult);
    const seconds = (Date.now() - started.getTime()) / 1000;
    const when = `${started.toISOString().slice(0, 16).replace("T", " ")} UTC`;
    const lines = [
      `Measured ${when} (${seconds.toFixed(0)} s, \`npm run bench -- targets\`, node ${process.version}, ${os.cpus().length} cores), load average ${loadStart} at the start and ${loadAverage()} at the end:`,
      "",
      ...table(results),
    ];
    console.log(`\n## issue 15's targets\n${lines.join("\n")}`);
    if (process.env.TARGETS_WRITE_README === "1") writeReadme(lines);
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
