/**
 * Saving the work to the browser's storage a moment after each change (debounced: a burst of
 * edits is one save), with the state shown to the user: saved (and when), saving, changes
 * waiting, or not saved with the reason. A save asked for while one runs runs after it, so
 * the last change is always the one stored.
 */
import type { WorkStore } from "./store";
import { storageProblem } from "./store";
import type { StoredWork } from "./storedWork";

export type SaveState =
  | { kind: "saved"; at: Date }
  | { kind: "pending" }
  | { kind: "saving" }
  | { kind: "failed"; reason: string };

export const AUTOSAVE_DELAY_MS = 700;

export function saveStateText(state: SaveState, store: string): string {
  switch (state.kind) {
    case "saved":
      return `Saved in this browser (${store}) at ${state.at.toLocaleTimeString("en-GB")}`;
    case "pending":
      return "Changes not saved yet…";
    case "saving":
      return "Saving…";
    case "failed":
      return `Not saved: ${state.reason}`;
  }
}

export class Autosave {
  private timer: ReturnType<typeof setTimeout> | undefined;
  private running: Promise<void> | undefined;
  private again = false;
  /** A change not stored yet. */
  private pending = false;

  constructor(
    private readonly store: WorkStore | undefined,
    private readonly snapshot: () => StoredWork,
    private readonly onState: (state: SaveState) => void,
    /** Why there is no store (when there is none). */
    private readonly noStore = "the browser offers no storage for this page",
    private readonly delay = AUTOSAVE_DELAY_MS,
  ) {}

  /** Whether the last change is stored (nothing waiting, running or failed). */
  stored(): boolean {
    return !this.pending && !this.running && this.timer === undefined;
  }

  /** Something changed: save a moment from now. */
  changed(): void {
    this.pending = true;
    this.onState({ kind: "pending" });
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), this.delay);
  }

  /** Saves a pending change now (and waits for it); resolves when the last state is stored or has failed. */
  async flush(): Promise<void> {
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = undefined;
    if (!this.pending && !this.running) return;
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = this.run();
    try {
      await this.running;
    } finally {
      this.running = undefined;
    }
    if (this.again) {
      this.again = false;
      await this.flush();
    }
  }

  private async run(): Promise<void> {
    if (!this.store) {
      this.pending = false;
      this.onState({ kind: "failed", reason: this.noStore });
      return;
    }
    this.pending = false;
    this.onState({ kind: "saving" });
    try {
      await this.store.save(this.snapshot());
      this.onState({ kind: "saved", at: new Date() });
    } catch (error) {
      this.pending = true;
      this.onState({ kind: "failed", reason: storageProblem(error) });
    }
  }
}
