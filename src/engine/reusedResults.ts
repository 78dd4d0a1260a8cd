/**
 * The last few answers of each SPAN function, with the arguments they were computed from, so
 * that a call with exactly the same arguments as a recent one gets that answer again instead of
 * calling the function: the three MAXMOMENT columns of a schedule row ask about one member, and
 * a row filled down 2,000 times asks the same five questions 2,000 times.
 *
 * Safe because the worksheet functions are pure: an answer (a table, or what was thrown)
 * depends on the arguments alone (functions/functions.ts only converts and solves; src/sheet
 * keeps no setting between calls). Arguments are the host-shaped values the function was given
 * (cellValues.ts `hostArgument`: null, scalars, 2-D arrays of scalars); they match when they
 * have the same shape and every cell is the same value by `Object.is` (0 and -0 differ, as a
 * function may tell them apart; NaN never reaches a function, cellValues maps values first).
 * The arguments are copied before the call, so a function that changed its arguments could not
 * change what a later call is compared with; the answer is kept as returned and never changed
 * (each use converts it afresh, cellValues.ts `engineResult` copies).
 *
 * Limits: RECENT_ANSWERS per function, newest first; the oldest is dropped. Memory is at most
 * that many answers per function, each within the function's own size limits.
 */

/** What a function call gave: its table, or what it threw. */
export type Answer = { returned: unknown } | { thrown: unknown };

/** Answers kept per function. */
export const RECENT_ANSWERS = 4;

interface Kept {
  args: readonly unknown[];
  answer: Answer;
}

/** True when two host-shaped values have the same shape and the same cells (Object.is). */
export function sameValue(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!sameValue(a[i], b[i])) return false;
  return true;
}

/** True when two calls' arguments are the same (sameValue for each): the one rule for reusing an answer. */
export function sameArgs(a: readonly unknown[], b: readonly unknown[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!sameValue(a[i], b[i])) return false;
  return true;
}

/** A copy of a host-shaped value (arrays copied; cells are primitives). */
function copyOf(value: unknown): unknown {
  return Array.isArray(value) ? value.map(copyOf) : value;
}

/** A copy of a call's arguments, to compare later calls with (sameArgs). */
export function copyArgs(args: readonly unknown[]): unknown[] {
  return args.map(copyOf);
}

export class ReusedResults {
  private readonly byFunction = new Map<string, Kept[]>();

  /**
   * The answer of `name` for these arguments: a recent call's with exactly the same arguments,
   * else what `call` returns or throws now (then kept, newest first).
   */
  answer(name: string, args: readonly unknown[], call: () => unknown): Answer {
    let kept = this.byFunction.get(name);
    if (kept) {
      for (let i = 0; i < kept.length; i++) {
        const found = kept[i];
        if (!sameArgs(found.args, args)) continue;
        if (i > 0) {
          kept.splice(i, 1);
          kept.unshift(found);
        }
        return found.answer;
      }
    } else this.byFunction.set(name, (kept = []));
    const copied = copyArgs(args);
    let answer: Answer;
    try {
      answer = { returned: call() };
    } catch (thrown) {
      answer = { thrown };
    }
    kept.unshift({ args: copied, answer });
    if (kept.length > RECENT_ANSWERS) kept.length = RECENT_ANSWERS;
    return answer;
  }
}
