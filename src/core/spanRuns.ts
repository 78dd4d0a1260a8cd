/**
 * Which pieces of a solution belong to which span: the one rule every per-span result uses.
 * A piece belongs to the span its start is in, by the one position rule (positions.ts): a
 * piece that starts at a node (within the position tolerance) belongs to the span on that
 * node's right. The pieces ascend in x, so each span's pieces are one run of the table, found
 * in one sweep over the pieces for the whole member.
 */
import type { Solution } from "./model";
import { pieceStartX, slicePieces } from "./pieceTable";
import { positionTolerance } from "./positions";

/** The run boundaries: span i's pieces are runs[i] to runs[i + 1] - 1 (one more entry than spans). */
export function spanRuns(solution: Solution): number[] {
  const { nodeX, pieces } = solution;
  const spanCount = nodeX.length - 1;
  const tol = positionTolerance(solution.length);
  const runs = new Array<number>(spanCount + 1);
  runs[0] = 0;
  let k = 0;
  for (let i = 0; i + 1 < spanCount; i++) {
    const next = nodeX[i + 1];
    while (k < pieces.count && pieceStartX(pieces, k) < next - tol) k++;
    runs[i + 1] = k;
  }
  runs[spanCount] = pieces.count;
  return runs;
}

/** The solution restricted to the pieces start to end - 1 (a run of spanRuns): its own table, the rest shared. */
export function withPieces(solution: Solution, start: number, end: number): Solution {
  return { ...solution, pieces: slicePieces(solution.pieces, start, end) };
}
