/**
 * The message behind a selected SPAN cell that shows `#VALUE!` or `#N/A`. The spreadsheet
 * host shows a custom function's message only on hover of the error indicator on desktop
 * (and some builds not at all: ../shared/TOOLCHAIN.md, "Error messages in the host"), and its
 * API gives no message with an error value (Excel.ValueErrorCellValue has a type and subtype
 * only: https://learn.microsoft.com/javascript/api/excel/excel.valueerrorcellvalue). So the
 * pane evaluates the cell's own call — the same worksheet function, with every argument read
 * through the host the way the host passes it — and shows the message it throws, whole.
 */
import { isSpanError } from "../core";
import { SPAN_EXPORTS } from "../engine/spanFunctions";
import { classifyArgument, parseSpanFormula, type ArgSource } from "./formulaRefs";
import { qualify, type CellValue, type Selection, type SheetHost } from "./host";

/** Error values a SPAN function gives with a message (the host keeps a message only on these). */
const WITH_MESSAGE = /^#(VALUE!|N\/A)$/;

/** The values of an argument's range, or the literal itself; throws with a message when it cannot be read. */
async function read(host: SheetHost, source: ArgSource, sheet: string): Promise<{ block: CellValue[][] } | { scalar: unknown } | undefined> {
  const on = "sheet" in source && source.sheet !== undefined ? source.sheet : sheet;
  switch (source.kind) {
    case "omitted":
      return undefined;
    case "literal":
      return { scalar: source.value };
    case "array":
      return { block: source.rows };
    case "range":
      return { block: await host.getValues(qualify(on, source.address)) };
    case "spill": {
      const spill = await host.spillRange(qualify(on, source.address));
      if (spill === undefined) throw new Error(`${source.text}: ${source.address} does not spill`);
      return { block: await host.getValues(spill) };
    }
    case "name": {
      const range = await host.resolveName(source.name, on);
      if (range === undefined) throw new Error(`${source.text}: no range has that name`);
      return { block: await host.getValues(range) };
    }
    default:
      throw new Error(`${source.text}: the pane cannot work out this expression`);
  }
}

/**
 * An argument as the host hands it to a custom function: a range parameter (`any[][]`) gets
 * the block, a single literal wrapped as [[v]]; a value parameter gets one cell; a skipped
 * argument arrives as null (the rule of src/engine/cellValues.ts hostArgument).
 */
function asPassed(value: { block: CellValue[][] } | { scalar: unknown } | undefined, kind: "block" | "value"): unknown {
  if (value === undefined) return null;
  const blank = (v: unknown) => (v === null || v === undefined ? "" : v);
  if ("block" in value) {
    const rows = value.block.map((row) => row.map(blank));
    return kind === "block" ? rows : (rows[0]?.[0] ?? "");
  }
  return kind === "block" ? [[blank(value.scalar)]] : blank(value.scalar);
}

/**
 * For a selected cell showing #VALUE! or #N/A from a SPAN formula: "H3 shows #VALUE!: <the
 * function's message>". Undefined for any other cell. Never throws.
 */
export async function cellMessage(host: SheetHost, selection: Selection): Promise<string | undefined> {
  if (typeof selection.value !== "string" || !WITH_MESSAGE.test(selection.value)) return undefined;
  const parsed = parseSpanFormula(selection.formula);
  if (!parsed.ok) return undefined;
  const { entry, args } = parsed.call;
  const where = `${selection.cell} shows ${selection.value}`;
  const passed: unknown[] = [];
  try {
    for (const argument of entry.arguments) passed.push(asPassed(await read(host, args[argument.name] ?? classifyArgument(""), selection.sheet), argument.kind));
  } catch (error) {
    return `${where}; the pane could not read its arguments: ${error instanceof Error ? error.message : String(error)}`;
  }
  try {
    SPAN_EXPORTS[entry.exportName](...passed);
  } catch (error) {
    const message = isSpanError(error) || error instanceof Error ? error.message : typeof (error as { message?: unknown })?.message === "string" ? (error as { message: string }).message : String(error);
    return `${where}: ${message}`;
  }
  return `${where}, but the same formula evaluated by the pane gives no error: recalculate the workbook, then hover the cell's error indicator for Excel's own message`;
}
