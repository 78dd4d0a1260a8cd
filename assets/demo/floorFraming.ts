/**
 * The demo workbook: level 2 floor framing of the Fernhollow Makerspace, a fictional
 * two-storey workshop building invented for Spanwise. Every member, load and number here is
 * made up for the demonstration. Shared by the workbench page (its preload) and
 * scripts/demoWorkbook.ts (assets/spanwise-demo.xlsx).
 *
 * Units: m, kN, kN/m, kN·m²; deflections shown in mm.
 */
import type { SheetInput } from "../../src/engine";

export const DEMO_TITLE = "Fernhollow Makerspace — level 2 floor framing (fictional demo)";
export const CAUTION = "Results are an aid to a qualified engineer, who checks them; local codes govern.";

interface Member {
  mark: string;
  spans: string;
  supports: string;
  EI: number;
  dead: number;
  live: number;
  point: number;
  pointAt: number;
  pointCase: string;
}

/** A dozen members of our own: joists, beams, a trimmer, a header and a balcony cantilever. */
export const MEMBERS: readonly Member[] = [
  { mark: "J-201", spans: "4.2", supports: "pin pin", EI: 2400, dead: 1.1, live: 1.8, point: 0, pointAt: 0, pointCase: "L" },
  { mark: "J-202", spans: "4.8", supports: "pin pin", EI: 2900, dead: 1.1, live: 1.8, point: 0, pointAt: 0, pointCase: "L" },
  { mark: "J-203", spans: "3.9 3.9", supports: "pin pin pin", EI: 2400, dead: 1.2, live: 2.0, point: 0, pointAt: 0, pointCase: "L" },
  { mark: "J-204", spans: "5.1", supports: "pin pin", EI: 3600, dead: 1.3, live: 1.8, point: 3.5, pointAt: 2.2, pointCase: "L" },
  { mark: "B-210", spans: "6.3", supports: "pin pin", EI: 21500, dead: 6.4, live: 9.0, point: 0, pointAt: 0, pointCase: "L" },
  { mark: "B-211", spans: "5.5 5.5", supports: "pin pin pin", EI: 18500, dead: 5.8, live: 8.1, point: 0, pointAt: 0, pointCase: "L" },
  { mark: "B-212", spans: "4.5 6 4.5", supports: "pin pin pin pin", EI: 24000, dead: 6.1, live: 7.5, point: 18, pointAt: 7.5, pointCase: "D" },
  { mark: "B-213", spans: "7.2", supports: "fixed pin", EI: 33000, dead: 7.0, live: 6.2, point: 22, pointAt: 3.0, pointCase: "L" },
  { mark: "T-220", spans: "3.4", supports: "fixed fixed", EI: 9800, dead: 2.6, live: 3.1, point: 14, pointAt: 1.1, pointCase: "D" },
  { mark: "H-230", spans: "2.7", supports: "pin pin", EI: 6200, dead: 4.4, live: 5.6, point: 9.5, pointAt: 1.35, pointCase: "L" },
  { mark: "C-240", spans: "4.6 1.8", supports: "pin pin free", EI: 15200, dead: 3.9, live: 4.8, point: 6, pointAt: 6.2, pointCase: "L" },
  { mark: "B-250", spans: "5 5 5 5", supports: "pin pin pin pin pin", EI: 27500, dead: 5.2, live: 7.9, point: 0, pointAt: 0, pointCase: "L" },
];

const SCHEDULE_HEADER = [
  "Member",
  "Spans (m)",
  "Supports",
  "EI (kN·m²)",
  "Dead udl D (kN/m)",
  "Live udl L (kN/m)",
  "Point P (kN)",
  "P at x (m)",
  "P case",
  "Loads (built from the row)",
  "Max M+ (kN·m)",
  "at x (m)",
  "Min M (kN·m)",
  "Max reaction (kN)",
  "Max deflection, service (mm)",
];

/** First schedule row (1-based sheet row) and the cells holding the combinations. */
export const SCHEDULE_FIRST_ROW = 6;
const STRENGTH = "$B$3";
const SERVICE = "$E$3";

function scheduleRow(member: Member, sheetRow: number): (string | number)[] {
  const r = sheetRow;
  const memberArgs = `B${r},J${r},C${r},D${r}`;
  return [
    member.mark,
    member.spans,
    member.supports,
    member.EI,
    member.dead,
    member.live,
    member.point,
    member.pointAt,
    member.pointCase,
    `="udl "&E${r}&" D; udl "&F${r}&" L"&IF(G${r}>0,"; point "&G${r}&" at "&H${r}&" "&I${r},"")`,
    `=INDEX(SPAN.MAXMOMENT(${memberArgs},${STRENGTH}),1,1)`,
    `=INDEX(SPAN.MAXMOMENT(${memberArgs},${STRENGTH}),1,2)`,
    `=INDEX(SPAN.MAXMOMENT(${memberArgs},${STRENGTH}),2,1)`,
    `=MAX(SPAN.REACTIONS(${memberArgs},${STRENGTH})*{0,1,0})`,
    `=1000*INDEX(SPAN.EXTREMES(${memberArgs},${SERVICE}),4,2)`,
  ];
}

function schedule(): SheetInput {
  const rows: (string | number | null)[][] = [
    [DEMO_TITLE],
    [CAUTION],
    ["Strength combination", "1.2D+1.6L", null, "Service combination", "D+L"],
    [],
    SCHEDULE_HEADER,
  ];
  MEMBERS.forEach((member, index) => rows.push(scheduleRow(member, SCHEDULE_FIRST_ROW + index)));
  const last = SCHEDULE_FIRST_ROW + MEMBERS.length - 1;
  rows.push([]);
  rows.push(["Largest", null, null, null, null, null, null, null, null, null, `=MAX(K${SCHEDULE_FIRST_ROW}:K${last})`, null, `=MIN(M${SCHEDULE_FIRST_ROW}:M${last})`, `=MAX(N${SCHEDULE_FIRST_ROW}:N${last})`, `=MAX(O${SCHEDULE_FIRST_ROW}:O${last})`]);
  return { name: "Schedule", cells: rows };
}

/** Beam B-211 in detail: load table by case, reactions, extremes and the diagram table. */
function member(): SheetInput {
  return {
    name: "Member",
    cells: [
      ["Beam B-211 in detail: two spans over the workshop bay, loads by case", null, null, null, null, null, null, "Diagram table: =SPAN.DIAGRAM(spans, loads, 23, supports, EI, combo)"],
      [CAUTION],
      ["Spans (m)", 5.5, 5.5, null, null, null, null, "=SPAN.DIAGRAM(B3:C3,A10:F14,23,B4:D4,B5,B6)"],
      ["Supports", "pin", "pin", "pin"],
      ["EI (kN·m²)", 18500],
      ["Combination", "1.2D+1.6L"],
      [],
      ["Load table"],
      ["type", "magnitude", "x start", "x end", "magnitude at end", "case"],
      ["udl", 5.8, null, null, null, "D"],
      ["udl", 8.1, null, null, null, "L"],
      ["point", 12, 2.5, null, null, "L"],
      ["linear", 0, 7, 11, 2.4, "D"],
      ["moment", 4, 5.5, null, null, "D"],
      [],
      ["Reactions (x, vertical, moment)"],
      ["=SPAN.REACTIONS(B3:C3,A10:F14,B4:D4,B5,B6)"],
      [],
      [],
      [],
      ["Sum of vertical reactions", "=SUM(A17#*{0,1,0})"],
      ["Factored load total", "=1.2*(5.8*11+0.5*2.4*4)+1.6*(8.1*11+12)"],
      [],
      ["Extremes (label, max, x at max, min, x at min)"],
      ["=SPAN.EXTREMES(B3:C3,A10:F14,B4:D4,B5,B6)"],
    ],
  };
}

/** A parametric span study: one joist layout, spans 3.0 to 6.0 m, strength and service checks. */
function study(): SheetInput {
  const rows: (string | number | null)[][] = [
    ["Span study: floor joist at 400 mm centres, loads per joist"],
    [CAUTION],
    ["Loads", "udl 0.45 D; udl 0.8 L"],
    ["EI (kN·m²)", 650, null, "Deflection limit span /", 360],
    ["Span (m)", "Max M, 1.2D+1.6L (kN·m)", "Midspan deflection, D+L (mm)", "Span / deflection", "Check", "Shear at ends (kN)"],
  ];
  for (let i = 0; i < 7; i++) {
    const r = 6 + i;
    rows.push([
      3 + 0.5 * i,
      `=INDEX(SPAN.MAXMOMENT(A${r},$B$3,,,"1.2D+1.6L"),1,1)`,
      `=1000*SPAN.DEFLECTION(A${r},$B$3,A${r}/2,,$B$4,"D+L")`,
      `=A${r}*1000/C${r}`,
      `=IF(D${r}>=$E$4,"ok","over limit")`,
      `=SPAN.SHEAR(A${r},$B$3,{0,1}*A${r},,,"1.2D+1.6L")`,
    ]);
  }
  return { name: "Study", cells: rows };
}

const STATIONS = [0, 2.5, 5, 7.5, 10, 12.5, 15, 17.5, 20];

/** Beam B-250 under the live load arranged span by span: combinations, envelope, peaks, influence line, a moving truck. */
function arrangements(): SheetInput {
  const rows: (string | number | null)[][] = [
    ["Beam B-250: four equal spans over the bench room, live load patterned span by span"],
    [CAUTION],
    ["Spans (m)", "5 5 5 5", null, "Loads", "udl 5.2 D; udl 7.9 L"],
    ["Supports", "pin pin pin pin pin", null, "EI (kN·m²)", 27500],
    ["Combination set", "ASCE7-2.3.1", null, "Pattern", "full L"],
    [],
    ["Individual combinations", null, "x (m)", "Moment envelope: largest (kN·m)", "governed by", "smallest (kN·m)", "governed by"],
  ];
  for (let i = 0; i < 14; i++) {
    rows.push([
      i === 0 ? "=SPAN.COMBOS(B5)" : null,
      null,
      i < STATIONS.length ? STATIONS[i] : null,
      i === 0 ? '=SPAN.ENVELOPE(B3,E3,C8:C16,B5,B4,E4,"moment",E5)' : null,
    ]);
  }
  rows.push([]);
  rows.push(["Governing peaks, classical arrangements (label, max, x, governed by, min, x, governed by)"]);
  rows.push(['=SPAN.PEAKS(B3,E3,B5,B4,E4,"standard L")']);
  rows.push([], [], [], []);
  rows.push([null, null, "Unit load at x (m)", "Influence line: moment at the second support (x = 5)"]);
  STATIONS.forEach((x, i) => rows.push([null, null, x, i === 0 ? '=SPAN.INFLUENCE(B3,"moment at 5",C30:C38,B4,E4)' : null]));
  rows.push([]);
  rows.push(["Moving load: pallet truck, axles 12 kN and 18 kN, 1.2 m apart (label, kN·m, x of first axle, direction, x)"]);
  rows.push(['=SPAN.MOVING(B3,"12 18","1.2","absolute moment",B4,E4)']);
  return { name: "Arrangements", cells: rows };
}

/** Beam B-213 checked as a steel I section: properties, stresses, a live-load deflection limit, utilisation. */
function checks(): SheetInput {
  const units = "length=m, force=kN, section=mm, stress=MPa";
  return {
    name: "Checks",
    cells: [
      ["Beam B-213 checks: steel I section, fixed at the wall, pinned at the column"],
      [CAUTION],
      ["Spans (m)", 7.2, null, "Supports", "fixed pin"],
      ["Loads", "udl 7 D; udl 6.2 L; point 22 at 3 L"],
      ["Section", "I", "d bf tf tw (mm)", "360 170 12.7 8", "E (GPa)", 200],
      ["EI (kN·m²)", '=SPAN.STIFFNESS(F5,D6,"GPa","mm^4","kN*m^2")', "Ix (mm^4)", "=INDEX(A9:C24,2,2)"],
      [],
      ["Section properties (property, value, unit)", null, null, null, "Bending stress, 1.2D+1.6L (fibre, largest MPa, x, smallest MPa, x)"],
      ['=SPAN.SECTION(B5,D5,"mm")', null, null, null, `=SPAN.STRESS(B3,B4,A9:C24,E3,B6,"1.2D+1.6L","${units}")`],
      [],
      [],
      [null, null, null, null, "Shear stress, 1.2D+1.6L (label, MPa, x)"],
      [null, null, null, null, `=SPAN.SHEARSTRESS(B3,B4,A9:C24,E3,B6,"1.2D+1.6L","${units}")`],
      [],
      [],
      [null, null, null, null, "Deflection check, live load, stated limit L/360 (span, length, deflection mm, x, span/deflection, limit, result)"],
      [null, null, null, null, '=SPAN.DEFLECTIONCHECK(B3,B4,"L/360",E3,B6,"L","length=m, force=kN, EI=kN*m^2, deflection=mm")'],
      [],
      [null, null, null, null, "Largest sagging moment, 1.2D+1.6L (kN·m)", '=INDEX(SPAN.MAXMOMENT(B3,B4,E3,B6,"1.2D+1.6L"),1,1)', "Stated capacity (kN·m), the engineer's figure", 180],
      [null, null, null, null, "Largest hogging moment, 1.2D+1.6L (kN·m)", '=INDEX(SPAN.MAXMOMENT(B3,B4,E3,B6,"1.2D+1.6L"),2,1)'],
      [null, null, null, null, "Utilisation (sagging, hogging)", "=SPAN.UTILISATION(F19:F20,H19)"],
    ],
  };
}

export const DEMO_SHEETS: readonly SheetInput[] = [schedule(), member(), study(), arrangements(), checks()];
