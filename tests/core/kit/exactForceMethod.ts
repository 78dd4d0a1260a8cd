/** Moved to src/verify/reference/exactForceMethod.ts (shared by the test suite and `spanwise verify`); re-exported for the tests. */
export * from "../../../src/verify/reference/exactForceMethod";
