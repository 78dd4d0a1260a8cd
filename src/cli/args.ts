/** Minimal option parsing: positional arguments and `--name value` / `--flag` options. */
import { UsageError } from "./io";

export interface ParsedArgs {
  positional: string[];
  options: Map<string, string | true>;
}

export function parseArgs(argv: readonly string[], valued: readonly string[], flags: readonly string[], usage?: string): ParsedArgs {
  const positional: string[] = [];
  const options = new Map<string, string | true>();
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (!arg.startsWith("--")) {
      positional.push(arg);
      continue;
    }
    const name = arg.slice(2);
    if (options.has(name)) throw new UsageError(`--${name} is given twice`, 2, usage);
    if (flags.includes(name)) options.set(name, true);
    else if (valued.includes(name)) {
      const value = argv[++i];
      if (value === undefined || value.startsWith("--")) throw new UsageError(`--${name} needs a value`, 2, usage);
      options.set(name, value);
    } else throw new UsageError(`unknown option ${arg}`, 2, usage);
  }
  return { positional, options };
}

export function optionText(args: ParsedArgs, name: string): string | undefined {
  const value = args.options.get(name);
  return typeof value === "string" ? value : undefined;
}
