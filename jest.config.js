/** Jest configuration: TypeScript through ts-jest; d3's ESM modules are transformed too. */
module.exports = {
  testEnvironment: "node",
  roots: ["<rootDir>/tests"],
  testMatch: ["**/*.test.ts"],
  transform: {
    "^.+\\.[tj]s$": ["ts-jest", { tsconfig: "tsconfig.json", diagnostics: { warnOnly: false } }],
  },
  moduleNameMapper: { "^office-addin-manifest$": "<rootDir>/tests/pane/support/officeAddinManifest.ts" },
  transformIgnorePatterns: ["/node_modules/(?!(d3-[^/]+|internmap)/)"],
  testTimeout: 60000,
  reporters: ["default", "<rootDir>/tests/support/summary-reporter.js"],
};
