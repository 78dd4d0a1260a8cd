/** Calls `action` once calls have stopped for `wait` ms; timers injectable for tests. */
export interface Timers {
  set(callback: () => void, ms: number): unknown;
  clear(handle: unknown): void;
}

const realTimers: Timers = {
  set: (callback, ms) => setTimeout(callback, ms),
  clear: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

export function debounce(action: () => void, wait: number, timers: Timers = realTimers): { (): void; cancel(): void } {
  let handle: unknown;
  const call = (() => {
    if (handle !== undefined) timers.clear(handle);
    handle = timers.set(() => {
      handle = undefined;
      action();
    }, wait);
  }) as { (): void; cancel(): void };
  call.cancel = () => {
    if (handle !== undefined) timers.clear(handle);
    handle = undefined;
  };
  return call;
}
