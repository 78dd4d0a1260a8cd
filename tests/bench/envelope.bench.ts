/**
 * Envelope cost (target: under 5 ms): 20 combinations by 101 stations on a 5-span member with
 * dead, live, snow and wind cases, without pattern, with the classical arrangements and with the
 * full search of live-load patterns. Also reports influence lines and a moving-load search.
 */
import { envelope, influenceLine, movingLoad, parseCombination, trainFrom, type Load, type Member } from "../../src/core";
import { measure, printTable } from "./measure";

function member(): Member {
  const spans = [6, 7.5, 6, 7.5, 6];
  const length = spans.reduce((a, b) => a + b, 0);
  const loads: Load[] = [
    { kind: "udl", magnitude: 4.2, xStart: 0, xEnd: length, magnitudeEnd: 4.2, loadCase: "D", row: 1 },
    { kind: "udl", magnitude: 3, xStart: 0, xEnd: length, magnitudeEnd: 3, loadCase: "L", row: 2 },
    { kind: "point", magnitude: 18, xStart: 9.5, xEnd: 9.5, magnitudeEnd: 18, loadCase: "L", row: 3 },
    { kind: "udl", magnitude: 1.1, xStart: 0, xEnd: length, magnitudeEnd: 1.1, loadCase: "S", row: 4 },
    { kind: "linear", magnitude: 0, xStart: 13.5, xEnd: 33, magnitudeEnd: 0.8, loadCase: "W", row: 5 },
  ];
  return { spans, supports: spans.concat([0]).map(() => ({ kind: "pin" })), stiffness: [30000], loads };
}

function combinations() {
  const texts: string[] = [];
  for (let i = 0; i < 20; i++) texts.push(`${(1.1 + 0.02 * i).toFixed(2)}D + ${(1.6 - 0.03 * i).toFixed(2)}L + ${(0.5 + 0.02 * i).toFixed(2)}S + ${(i % 3) * 0.5}W`);
  return texts.map(parseCombination);
}

export function run(): void {
  const m = member();
  const combos = combinations();
  const stations = Array.from({ length: 101 }, (_, i) => (33 * i) / 100);
  const rows = (["none", "standard", "full"] as const).map((pattern) => {
    const t = measure(() => envelope(m, combos, stations, { pattern }));
    return [`envelope 20 x 101, pattern ${pattern}`, t.perCallMs.toFixed(3), t.perCallMs < 5 ? "OK" : "OVER 5 ms"];
  });
  const il = measure(() => influenceLine({ ...m, loads: [] }, { kind: "moment", x: 13.5 }, stations));
  rows.push(["influence line, 101 positions", il.perCallMs.toFixed(3), ""]);
  const train = trainFrom([35, 145, 145], [4.3, 4.3]);
  const mv = measure(() => movingLoad({ ...m, loads: [] }, train, { kind: "absolute-moment" }), 1000);
  rows.push(["moving load, 3 axles, absolute moment", mv.perCallMs.toFixed(3), ""]);
  printTable(["case", "ms per call", "target"], rows);
}
