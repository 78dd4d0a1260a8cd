/** The formula cells of a sheet in typed arrays: the same answers as a list of objects. */
import fc from "fast-check";
import { FormulaTable, type FormulaCell } from "../../src/cli/formulaTable";

const cellsArb = fc
  .uniqueArray(fc.tuple(fc.integer({ min: 0, max: 1_048_575 }), fc.integer({ min: 0, max: 16_383 })), { selector: ([r, c]) => `${r}:${c}`, maxLength: 300 })
  .chain((positions) =>
    fc.tuple(
      fc.constant(positions.sort((a, b) => a[0] - b[0] || a[1] - b[1])),
      fc.array(fc.tuple(fc.constantFrom("plain", "dynamic", "legacy") as fc.Arbitrary<FormulaCell["kind"]>, fc.nat(3), fc.nat(3)), { minLength: positions.length, maxLength: positions.length }),
    ),
  )
  .map(([positions, kinds]) =>
    positions.map(([row, col], i): FormulaCell => {
      const [kind, down, across] = kinds[i];
      return kind === "plain" ? { row, col, kind } : { row, col, kind, ref: { top: row, left: col, bottom: row + down, right: col + across } };
    }),
  );

describe("FormulaTable", () => {
  it("holds what it was given, finds each cell, and says which ranges cover other cells", () => {
    fc.assert(
      fc.property(cellsArb, (cells) => {
        const table = new FormulaTable();
        cells.forEach((cell, i) => expect(table.add(cell.row, cell.col, cell.kind, cell.ref)).toBe(i));
        expect(table.length).toBe(cells.length);
        cells.forEach((cell, i) => {
          expect(table.get(i)).toEqual(cell);
          expect(table.indexOf(cell.row, cell.col)).toBe(i);
          expect(table.coversOthers(i)).toBe(cell.ref !== undefined && (cell.ref.bottom > cell.row || cell.ref.right > cell.col));
          expect(table.indexOf(cell.row, cell.col + 1)).toBe(cells.findIndex((c) => c.row === cell.row && c.col === cell.col + 1));
        });
        table.clear();
        expect(table.length).toBe(0);
        expect(table.indexOf(0, 0)).toBe(-1);
      }),
      { numRuns: 100 },
    );
  });

  it.each([
    ["a cell before the last", [[2, 3], [2, 2]]],
    ["the same cell twice", [[2, 3], [2, 3]]],
    ["an earlier row", [[5, 0], [4, 9]]],
  ])("refuses %s (cells come in document order)", (_, positions) => {
    const table = new FormulaTable();
    expect(() => positions.forEach(([row, col]) => table.add(row, col, "plain"))).toThrow(/document order/);
  });

  it("refuses a range that does not start at its own cell", () => {
    expect(() => new FormulaTable().add(1, 1, "dynamic", { top: 0, left: 1, bottom: 2, right: 1 })).toThrow(/own cell/);
  });
});
