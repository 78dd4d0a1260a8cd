/**
 * Pane redraw in headless Chromium: a 10-span member (invented: spans 4 to 7.6 m, udl by case,
 * point loads, a couple, a spring and a hinge) selected in the workbench; one redraw = solve,
 * diagram rows, SVG text, into the page, layout forced. Target: under 16 ms (one frame).
 * Run: node tests/bench/run.js pane
 */
import { buildPages, openBrowser, OUT, serve } from "../pane/browser/pages";

export async function run(): Promise<void> {
  await buildPages();
  const server = await serve(OUT);
  const context = await openBrowser("bench");
  try {
    const page = await context.newPage();
    await page.goto(`${server.url}/taskpane.html`);
    await page.waitForSelector("body[data-pane-ready='true']", { timeout: 60000 });
    const bench = page.frames().find((f) => f.url().endsWith("/workbench.html"));
    if (!bench) throw new Error("no workbench frame");
    await bench.evaluate(() => {
      const api = (window as any).spanwiseWorkbench;
      const spans = [4, 5.2, 6, 7.6, 5, 4.4, 6.8, 5.6, 4.8, 6.2];
      api.setValues("Member!A70:J70", [spans]);
      api.setValues("Member!A71:K71", [["fixed", "pin", "pin", 9000, "pin", "hinge", "pin", "pin", "pin", "pin", "pin"]]);
      const loads: (string | number | null)[][] = [
        ["udl", 4.2, null, null, null, "D"],
        ["udl", 6.5, null, null, null, "L"],
        ["linear", 0, 10, 22, 3.5, "D"],
      ];
      for (let i = 0; i < 10; i++) loads.push(["point", 8 + i, 2 + 5.4 * i, null, null, i % 2 ? "L" : "D"]);
      loads.push(["moment", 5, 30, null, null, "D"]);
      api.setValues("Member!A72:F85", loads);
      api.setValues("Member!A86:B86", [[30000, "1.2D+1.6L"]]);
      api.setFormula("Member!A88", "=SPAN.EXTREMES(A70:J70,A72:F85,A71:K71,A86,B86)");
      api.select("Member!A88");
    });
    await page.waitForFunction(() => document.querySelectorAll(".figure svg g.panel").length === 3, undefined, { timeout: 30000 });
    const times = await page.evaluate(() => {
      const pane = (window as any).spanwisePane;
      for (let i = 0; i < 20; i++) pane.redraw();

      const out: number[] = [];
      for (let i = 0; i < 200; i++) out.push(pane.redraw());
      return out;
    });
    times.sort((a, b) => a - b);
    const at = (q: number): number => times[Math.min(times.length - 1, Math.floor(q * times.length))];
    const rows = await page.$eval(".figure svg .panel[data-quantity='moment'] .curve", (p) => (p.getAttribute("d")?.match(/L/g)?.length ?? 0) + 1);
    console.log(`pane redraw, 10-span member (${rows} stations drawn per curve), 200 redraws in headless Chromium:`);
    console.log(`  median ${at(0.5).toFixed(2)} ms, p95 ${at(0.95).toFixed(2)} ms, max ${times[times.length - 1].toFixed(2)} ms (budget 16 ms)`);
  } finally {
    await context.close();
    await server.close();
  }
}
