/** The floor's digit scan (digitScan.ts) reads the numbers a row's cells hold. */
import { scanDigits } from "./digitScan";

describe("scanDigits: the sum of the numbers written in a text", () => {
  test.each([
    ["4.33 4.31 5.71", 4.33 + 4.31 + 5.71],
    ["udl 2.57 to 4.33; point 12.67 at 0.45", 2.57 + 4.33 + 12.67 + 0.45],
    ["no numbers", 0],
    ["7", 7],
    ["10.5.", 10.5],
  ])("%s", (text, sum) => {
    expect(scanDigits(text)).toBeCloseTo(sum, 12);
  });
});
