/**
 * The `spanwise` command: `calc` evaluates workbooks headless, `demo` writes the demo
 * workbook, `start` builds and serves the add-in and the workbench (see start.ts), `stop`
 * stops it and removes the sideload registration (stop.ts).
 */
import { optionText, parseArgs } from "./args";
import { calc, EXIT } from "./calc";
import { UsageError, type Io } from "./io";

export const CALC_USAGE = `usage:
  spanwise calc <book.xlsx> [--out <file.xlsx>] [--force] [--report <errors.csv>]
      evaluates every formula (SPAN functions included) and writes a copy of the workbook
      (default <book>.calculated.xlsx) in which only the formulas' cached values have changed:
      formulas, styles, names, charts and every other part stay as they were.
  spanwise calc <book.xlsx> --csv <sheet> [--report <errors.csv>]
      prints one sheet's values as CSV (15 significant digits; text that would read as a
      formula is escaped) and writes no workbook.
  exit codes: 0 every formula evaluated; 1 some cells are errors (listed on stderr, all in
  --report); 2 wrong usage; 3 the input cannot be read or is refused; 4 the output cannot be
  written (it exists without --force, or it is the input); 5 an unexpected failure.
`;

/**
 * The demo command's usage. It names demoWorkbook.ts's default path, and that module loads
 * exceljs (half a second), so it is read only when this text is shown or the command runs.
 */
export async function demoUsage(): Promise<string> {
  const { DEMO_WORKBOOK } = await import("./demoWorkbook");
  return `usage:
  spanwise demo [--out <file.xlsx>] [--force]
      writes the demo workbook (default ${DEMO_WORKBOOK}), its spills stored as dynamic arrays.
`;
}

export const START_USAGE = `usage:
  spanwise start [--port <n>]
      builds and serves the add-in and the workbench over HTTPS on localhost.
  spanwise stop
      stops that server and removes the add-in's sideload registration.
`;

export const VERIFY_USAGE = `usage:
  spanwise verify [--out <verification.pdf|.html>] [--paper A4|letter] [--force]
      runs the handbook and independent-reference cases the test suite runs and writes the verification document
      (default verification.pdf); exits 1 when any case fails.
`;

export const REPORT_USAGE = `usage:
  spanwise report <book.xlsx> (--cell <Sheet!A5> | --range <Sheet!A5:A20>) [--out <file.pdf|.html>] [--paper A4|letter] [--force]
      writes the member calculation report of a SPAN cell (one per SPAN cell of a range).
`;

/** Every command's usage, for `spanwise help` and an unknown command. */
export async function usage(): Promise<string> {
  return [CALC_USAGE, await demoUsage(), VERIFY_USAGE, REPORT_USAGE, START_USAGE].map((u, i) => (i === 0 ? u : u.replace("usage:\n", ""))).join("");
}

const defaultIo: Io = { stdout: process.stdout, stderr: process.stderr };

function wantsHelp(args: readonly string[]): boolean {
  return args.includes("--help") || args.includes("-h");
}

function help(io: Io, text: string): number {
  io.stdout.write(text);
  return 0;
}

export async function main(argv: readonly string[], io: Io = defaultIo): Promise<number> {
  try {
    const [command, ...rest] = argv;
    switch (command) {
      case "calc": {
        if (wantsHelp(rest)) return help(io, CALC_USAGE);
        const args = parseArgs(rest, ["out", "csv", "report"], ["force"], CALC_USAGE);
        if (args.positional.length !== 1) throw new UsageError("calc takes one workbook: spanwise calc <book.xlsx>", 2, CALC_USAGE);
        return await calc(
          { input: args.positional[0], out: optionText(args, "out"), csv: optionText(args, "csv"), report: optionText(args, "report"), force: args.options.has("force") },
          io,
        );
      }
      case "demo": {
        const demoText = await demoUsage();
        if (wantsHelp(rest)) return help(io, demoText);
        const args = parseArgs(rest, ["out"], ["force"], demoText);
        if (args.positional.length > 0) throw new UsageError(`demo takes no workbook (${args.positional[0]}): use --out`, 2, demoText);
        const { DEMO_WORKBOOK, writeDemoWorkbook } = await import("./demoWorkbook");
        return await writeDemoWorkbook(optionText(args, "out") ?? DEMO_WORKBOOK, args.options.has("force"), io);
      }
      case "verify": {
        if (wantsHelp(rest)) return help(io, VERIFY_USAGE);
        const args = parseArgs(rest, ["out", "paper"], ["force"], VERIFY_USAGE);
        if (args.positional.length) throw new UsageError("verify takes no workbook: spanwise verify [--out verification.pdf]", 2, VERIFY_USAGE);
        const { verify } = await import("./verify");
        return await verify({ out: optionText(args, "out"), paper: optionText(args, "paper"), force: args.options.has("force") }, io);
      }
      case "report": {
        if (wantsHelp(rest)) return help(io, REPORT_USAGE);
        const args = parseArgs(rest, ["out", "paper", "cell", "range"], ["force"], REPORT_USAGE);
        if (args.positional.length !== 1) throw new UsageError("report takes one workbook: spanwise report <book.xlsx> --cell Sheet!A5", 2, REPORT_USAGE);
        const { report } = await import("./report");
        return await report({ input: args.positional[0], cell: optionText(args, "cell"), range: optionText(args, "range"), out: optionText(args, "out"), paper: optionText(args, "paper"), force: args.options.has("force") }, io);
      }
      case "start": {
        if (wantsHelp(rest)) return help(io, START_USAGE);
        const args = parseArgs(rest, ["port"], [], START_USAGE);
        const { start } = await import("./start");
        return await start({ port: Number(optionText(args, "port") ?? 3000) }, io);
      }
      case "stop": {
        parseArgs(rest, [], []);
        const { stop } = await import("./stop");
        return await stop(io);
      }
      case undefined:
      case "help":
      case "--help":
      case "-h":
        io.stdout.write(await usage());
        return command === undefined ? 2 : 0;
      default:
        throw new UsageError(`unknown command "${command}"`);
    }
  } catch (error) {
    if (error instanceof UsageError) {
      io.stderr.write(`spanwise: ${error.message}\n`);
      if (error.exitCode === 2) io.stderr.write(error.usage ?? (await usage()));
      return error.exitCode;
    }
    io.stderr.write(`spanwise: unexpected failure: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    return EXIT.internal;
  }
}
