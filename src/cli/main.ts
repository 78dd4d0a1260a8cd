/**
 * The `spanwise` command: `calc` evaluates workbooks headless, `demo` writes the demo
 * workbook, `start` builds and serves the add-in and the workbench (see start.ts).
 */
import { optionText, parseArgs } from "./args";
import { calc } from "./calc";
import { DEMO_WORKBOOK, writeDemoWorkbook } from "./demoWorkbook";
import { UsageError, type Io } from "./io";

export const USAGE = `usage:
  spanwise calc <book.xlsx> [--out <file.xlsx>] [--csv <sheet>] [--force]
      evaluates every formula (SPAN functions included) and writes the values into a new
      workbook (default <book>.calculated.xlsx); --csv prints a sheet's values as CSV.
  spanwise demo [--out <file.xlsx>] [--force]
      writes the demo workbook (default ${DEMO_WORKBOOK}).
  spanwise verify [--out <verification.pdf|.html>] [--paper A4|letter] [--force]
      runs the handbook cases the test suite runs and writes the verification document
      (default verification.pdf); exits 1 when any case fails.
  spanwise report <book.xlsx> (--cell <Sheet!A5> | --range <Sheet!A5:A20>) [--out <file.pdf|.html>] [--paper A4|letter] [--force]
      writes the member calculation report of a SPAN cell (one per SPAN cell of a range).
  spanwise start [--port <n>]
      builds and serves the add-in and the workbench over HTTPS on localhost.
`;

const defaultIo: Io = { stdout: process.stdout, stderr: process.stderr };

export async function main(argv: readonly string[], io: Io = defaultIo): Promise<number> {
  try {
    const [command, ...rest] = argv;
    switch (command) {
      case "calc": {
        const args = parseArgs(rest, ["out", "csv"], ["force"]);
        if (args.positional.length !== 1) throw new UsageError("calc takes one workbook: spanwise calc <book.xlsx>");
        return await calc({ input: args.positional[0], out: optionText(args, "out"), csv: optionText(args, "csv"), force: args.options.has("force") }, io);
      }
      case "demo": {
        const args = parseArgs(rest, ["out"], ["force"]);
        return await writeDemoWorkbook(optionText(args, "out") ?? DEMO_WORKBOOK, args.options.has("force"), io);
      }
      case "verify": {
        const args = parseArgs(rest, ["out", "paper"], ["force"]);
        if (args.positional.length) throw new UsageError("verify takes no workbook: spanwise verify [--out verification.pdf]");
        const { verify } = await import("./verify");
        return await verify({ out: optionText(args, "out"), paper: optionText(args, "paper"), force: args.options.has("force") }, io);
      }
      case "report": {
        const args = parseArgs(rest, ["out", "paper", "cell", "range"], ["force"]);
        if (args.positional.length !== 1) throw new UsageError("report takes one workbook: spanwise report <book.xlsx> --cell Sheet!A5");
        const { report } = await import("./report");
        return await report({ input: args.positional[0], cell: optionText(args, "cell"), range: optionText(args, "range"), out: optionText(args, "out"), paper: optionText(args, "paper"), force: args.options.has("force") }, io);
      }
      case "start": {
        const args = parseArgs(rest, ["port"], []);
        const { start } = await import("./start");
        return await start({ port: Number(optionText(args, "port") ?? 3000) }, io);
      }
      case undefined:
      case "help":
      case "--help":
        io.stdout.write(USAGE);
        return command === undefined ? 2 : 0;
      default:
        throw new UsageError(`unknown command "${command}"`);
    }
  } catch (error) {
    if (error instanceof UsageError) {
      io.stderr.write(`spanwise: ${error.message}\n`);
      if (error.exitCode === 2) io.stderr.write(USAGE);
      return error.exitCode;
    }
    io.stderr.write(`spanwise: unexpected failure: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    return 1;
  }
}
