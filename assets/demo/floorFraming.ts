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

export const DEMO_SHEETS: readonly SheetInput[] = [schedule(), member(), study()];
