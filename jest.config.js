/** Jest configuration: TypeScript through ts-jest; the summary reporter closes every run with 'N passed, N failed'. */
module.exports = {
  testEnvironment: "node",
  roots: ["<rootDir>/tests"],
  testMatch: ["**/*.test.ts"],
  transform: {
    "^.+\\.[tj]s$": ["ts-jest", { tsconfig: "tsconfig.json", diagnostics: { warnOnly: false } }],
  },
  moduleNameMapper: { "^office-addin-manifest$": "<rootDir>/tests/pane/support/officeAddinManifest.ts" },
  testTimeout: 60000,
  reporters: ["default", "<rootDir>/tests/support/summary-reporter.js"],
};
