/**
 * The few built-ins newer than ECMAScript 2016 that the shared code (src/core, src/sheet) calls,
 * supplied where the runtime lacks them. With separate runtimes, Windows runs functions.js in
 * the JavaScript-only custom-functions runtime, which supports ECMAScript 2016 (maintainer
 * answer in OfficeDev/office-js-docs-pr#4496). webpack puts this module first in the
 * functions entry; tsconfig.functions.json type-checks the entry against the ES2016 library
 * plus exactly these declarations, so any other newer built-in fails the build's test
 * (tests/functions/languageLevel.test.ts). Each implementation follows its specification for
 * the cases the code uses (plain arrays, objects and strings) and is checked against the
 * native one in that test.
 */

export function flatMap<T, U>(this: T[], callback: (value: T, index: number, array: T[]) => U | readonly U[], thisArg?: unknown): U[] {
  const out: U[] = [];
  for (let i = 0; i < this.length; i++) {
    if (!(i in this)) continue;
    const mapped = callback.call(thisArg, this[i], i, this);
    if (Array.isArray(mapped)) for (let j = 0; j < mapped.length; j++) out.push(mapped[j]);
    else out.push(mapped as U);
  }
  return out;
}

export function entries<T>(object: { [key: string]: T }): [string, T][] {
  return Object.keys(object).map((key) => [key, object[key]] as [string, T]);
}

export function values<T>(object: { [key: string]: T }): T[] {
  return Object.keys(object).map((key) => object[key]);
}

export function trimStart(this: string): string {
  return String(this).replace(/^[\s\uFEFF\xA0]+/, "");
}

function define(target: object, name: string, value: unknown): void {
  if (!(name in target)) Object.defineProperty(target, name, { value, writable: true, configurable: true, enumerable: false });
}

define(Array.prototype, "flatMap", flatMap);
define(Object, "entries", entries);
define(Object, "values", values);
define(String.prototype, "trimStart", trimStart);
