/**
 * setImmediate for the browser, in place of the `setimmediate` package jszip requires for its
 * side effect (webpack aliases that package to this file; webpack.config.js). The package's
 * polyfill turns a non-function argument into `new Function(...)` and probes for
 * `importScripts`, which the page's no-eval, no-worker policy forbids
 * (tests/hardening/network.test.ts); this one takes functions only and runs each callback in
 * its own task through a MessageChannel (a nested setTimeout would be clamped to 4 ms).
 */
type Callback = (...args: unknown[]) => void;

const scope = (typeof self !== "undefined" ? self : window) as unknown as {
  setImmediate?: (fn: Callback, ...args: unknown[]) => number;
  clearImmediate?: (id: number) => void;
};

if (typeof scope.setImmediate !== "function") {
  const pending = new Map<number, () => void>();
  let next = 0;
  const channel = new MessageChannel();
  channel.port1.onmessage = (event: MessageEvent<number>) => {
    const run = pending.get(event.data);
    pending.delete(event.data);
    if (run) run();
  };
  scope.setImmediate = (fn: Callback, ...args: unknown[]): number => {
    if (typeof fn !== "function") throw new TypeError("setImmediate takes a function");
    const id = ++next;
    pending.set(id, () => fn(...args));
    channel.port2.postMessage(id);
    return id;
  };
  scope.clearImmediate = (id: number): void => {
    pending.delete(id);
  };
}

export {};
