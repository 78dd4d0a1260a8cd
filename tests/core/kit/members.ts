/** Moved to src/verify/members.ts (shared by the test suite and `spanwise verify`); re-exported for the tests. */
export * from "../../../src/verify/members";
