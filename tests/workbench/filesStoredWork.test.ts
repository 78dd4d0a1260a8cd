/**
 * The stored form of the workbench's work (src/workbench/files/storedWork.ts): a record round
 * trips through both forms (IndexedDB's objects, localStorage's JSON text), and every kind of
 * damage is refused with a message naming the field, never half-applied.
 */
import { OPEN_LIMITS } from "../../src/workbench/files/limits";
import { openStore, storageProblem } from "../../src/workbench/files/store";
import { decodeWork, encodeWorkText, fromBase64, StoredDataError, toBase64, type StoredWork } from "../../src/workbench/files/storedWork";

function work(overrides: Partial<StoredWork> = {}): StoredWork {
  return {
    format: "spanwise-workbench",
    version: 1,
    name: "book.xlsx",
    savedAt: "2026-12-02T06:00:00.000Z",
    origin: { kind: "sheets", sheets: [{ name: "Sheet1", cells: [["6 8 6", 2.5, null, true], [], ["=SPAN.REACTIONS(A1,B1)"]] }] },
    sheets: ["Beam", "Added"],
    changes: [
      [0, 0, 1, 3.25],
      [1, 4, 2, "=Beam!B1*2"],
      [0, 2, 0, null],
    ],
    unsavedToFile: true,
    ...overrides,
  };
}

describe("stored work", () => {
  it("round-trips as an object and as text, file bytes included", () => {
    const bytes = new Uint8Array(70_000).map((_, i) => (i * 7919) % 256);
    for (const record of [work(), work({ origin: { kind: "file", bytes } })]) {
      expect(decodeWork(record)).toEqual(record);
      expect(decodeWork(encodeWorkText(record))).toEqual(record);
    }
    expect(fromBase64(toBase64(bytes))).toEqual(bytes);
    expect(toBase64(new Uint8Array([104, 105]))).toBe(Buffer.from("hi").toString("base64"));
  });

  const bad: [string, unknown, RegExp][] = [
    ["nothing", undefined, /not an object/],
    ["text that is not JSON", "{not json", /not JSON/],
    ["an array", [], /not an object/],
    ["another format", { ...work(), format: "other" }, /not the workbench's/],
    ["a newer version", { ...work(), version: 2 }, /version 2; this page reads version 1/],
    ["no name", { ...work(), name: 5 }, /file name/],
    ["no time", { ...work(), savedAt: undefined }, /no time/],
    ["no saved flag", { ...work(), unsavedToFile: "yes" }, /saved to a file/],
    ["no origin", { ...work(), origin: null }, /no origin/],
    ["an unknown origin", { ...work(), origin: { kind: "url" } }, /"url" is not "file" or "sheets"/],
    ["an empty file", { ...work(), origin: { kind: "file", bytes: new Uint8Array(0) } }, /empty/],
    ["a file that is not base64", { ...work(), origin: { kind: "file", bytes: "%%%%" } }, /base64/],
    ["a file beyond the open limit", { ...work(), origin: { kind: "file", bytes: new Uint8Array(OPEN_LIMITS.fileBytes + 1) } }, /larger than/],
    ["an origin sheet without cells", { ...work(), origin: { kind: "sheets", sheets: [{ name: "A" }] } }, /no name or no cells/],
    ["an origin cell holding an object", { ...work(), origin: { kind: "sheets", sheets: [{ name: "A", cells: [[{}]]}] } }, /row 1 column 1: a cell holds object/],
    ["an infinite number", { ...work(), changes: [[0, 0, 0, Infinity]] }, /not finite/],
    ["over-long text", { ...work(), changes: [[0, 0, 0, "x".repeat(32_768)]] }, /longer than 32767/],
    ["no sheets", { ...work(), sheets: [] }, /1 to 255 sheet names/],
    ["a blank sheet name", { ...work(), sheets: [" "] }, /stored sheet 1 \(" "\): a stored sheet name is 1 to 255 characters, not blank/],
    ["an over-long sheet name", { ...work(), sheets: ["x".repeat(256)] }, /1 to 255 characters/],
    ["two sheets of one name", { ...work(), sheets: ["Beam", "BEAM"] }, /already/],
    ["a change that is not a tuple", { ...work(), changes: [[0, 0, 1]] }, /change 1 is not \[sheet, row, column, input\]/],
    ["a change on a missing sheet", { ...work(), changes: [[2, 0, 0, 1]] }, /change 1: sheet 2 is not a whole number from 0 to 1/],
    ["a negative row", { ...work(), changes: [[0, -1, 0, 1]] }, /row -1/],
    ["a fractional column", { ...work(), changes: [[0, 0, 1.5, 1]] }, /column 1.5/],
    ["a column beyond the sheet", { ...work(), changes: [[0, 0, 16_384, 1]] }, /column 16384 is not a whole number from 0 to 16383/],
    ["fewer sheets than the origin", { ...work(), sheets: ["A"], changes: [], origin: { kind: "sheets", sheets: [{ name: "A", cells: [] }, { name: "B", cells: [] }] } }, /names 1 sheets, fewer than its origin's 2/],
  ];
  it.each(bad)("refuses %s", (_what, value, message) => {
    expect(() => decodeWork(value)).toThrow(StoredDataError);
    expect(() => decodeWork(value)).toThrow(message);
  });

  it("restores sheet names a file may hold though the rename rules refuse them (written by other programs)", () => {
    const record = work({ sheets: ["a/b", "x".repeat(40)], changes: [] });
    expect(decodeWork(record).sheets).toEqual(["a/b", "x".repeat(40)]);
  });

  it("refuses more changes than the open limit without reading them one by one", () => {
    const many = { ...work(), changes: { length: OPEN_LIMITS.cells + 1 } };
    expect(() => decodeWork(many)).toThrow(/not a list/);
    const long = { ...work(), changes: new Array(OPEN_LIMITS.cells + 1).fill([0, 0, 0, 1]) };
    expect(() => decodeWork(long)).toThrow(/at most 300000 cells/);
  });
});

describe("the localStorage store (where IndexedDB is unavailable)", () => {
  class FakeStorage {
    readonly items = new Map<string, string>();
    constructor(private readonly quota = Infinity) {}
    getItem(key: string): string | null {
      return this.items.get(key) ?? null;
    }
    setItem(key: string, value: string): void {
      if (value.length > this.quota) throw Object.assign(new Error("Setting the value exceeded the quota."), { name: "QuotaExceededError" });
      this.items.set(key, value);
    }
    removeItem(key: string): void {
      this.items.delete(key);
    }
  }

  it("keeps the record as text that decodes to the same work, sets unreadable records aside and clears", async () => {
    const storage = new FakeStorage();
    const store = await openStore({ localStorage: storage as unknown as Storage });
    expect(store.kind).toBe("localStorage");
    expect(await store.load()).toBeUndefined();
    const record = work({ origin: { kind: "file", bytes: new Uint8Array([80, 75, 3, 4, 1, 2, 3]) } });
    await store.save(record);
    expect(decodeWork(await store.load())).toEqual(record);
    await store.setAside("garbage");
    expect(storage.getItem("spanwise-workbench:unreadable")).toBe("garbage");
    await store.clear();
    expect(await store.load()).toBeUndefined();
  });

  it("reports a full quota as a sentence, and no storage at all as a failure to open", async () => {
    const store = await openStore({ localStorage: new FakeStorage(10) as unknown as Storage });
    const error = await store.save(work()).catch((e: unknown) => e);
    expect(storageProblem(error)).toBe("the browser's storage for this page is full (free space, or save the workbook as a file)");
    await expect(openStore({})).rejects.toThrow(/no browser storage for this page/);
  });
});
