import { SpanError } from "../../src/core";
import { describeError, guarded, hostError, MESSAGE_LIMIT } from "../../src/sheet/hostError";

describe("describeError", () => {
  test.each([
    [new SpanError("#VALUE!", "load row 3: bad"), "#VALUE!", "load row 3: bad"],
    [new SpanError("#N/A", "slope needs EI"), "#N/A", "slope needs EI"],
    [new TypeError("x is undefined"), "#VALUE!", "unexpected problem: x is undefined"],
    ["thrown text", "#VALUE!", "unexpected problem: thrown text"],
    [undefined, "#VALUE!", "unexpected problem: undefined"],
  ])("%p", (error, code, message) => {
    expect(describeError(error)).toEqual({ code, message });
  });

  test("long messages are clipped for the host", () => {
    const { message } = describeError(new SpanError("#VALUE!", "x".repeat(1000)));
    expect(message.length).toBe(MESSAGE_LIMIT);
    expect(message.endsWith("...")).toBe(true);
  });
});

describe("hostError and guarded in Node (no runtime)", () => {
  test("throws a SpanError-shaped object", () => {
    const e = hostError(new RangeError("boom")) as SpanError;
    expect(e).toBeInstanceOf(SpanError);
    expect(e.code).toBe("#VALUE!");
    expect(() =>
      guarded(() => {
        throw new Error("deep");
      }),
    ).toThrow(/unexpected problem: deep/);
    expect(guarded(() => 5)).toBe(5);
  });
});

describe("hostError with the runtime's CustomFunctions", () => {
  const g = globalThis as { CustomFunctions?: unknown };
  afterEach(() => {
    delete g.CustomFunctions;
  });

  test("maps #VALUE! to invalidValue and #N/A to notAvailable", () => {
    const made: unknown[][] = [];
    g.CustomFunctions = {
      Error: function RuntimeError(this: unknown, code: string, message: string) {
        made.push([code, message]);
      },
      ErrorCode: { invalidValue: "IV", notAvailable: "NA" },
    };
    hostError(new SpanError("#VALUE!", "a"));
    hostError(new SpanError("#N/A", "b"));
    hostError(new Error("c"));
    expect(made).toEqual([
      ["IV", "a"],
      ["NA", "b"],
      ["IV", "unexpected problem: c"],
    ]);
  });

  test("an incomplete runtime object is ignored", () => {
    g.CustomFunctions = { associate: () => undefined };
    expect(hostError(new SpanError("#N/A", "b"))).toBeInstanceOf(SpanError);
  });
});
