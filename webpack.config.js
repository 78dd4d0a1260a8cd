/* eslint-disable */
/**
 * Build of every page Spanwise ships, as an exported array of webpack configurations.
 *
 * - addinConfig: the custom-functions bundle (functions.js + functions.html) with the
 *   generated functions.json (custom-functions-metadata-plugin writes it from the JSDoc in
 *   functions/functions.ts and appends the CustomFunctions.associate calls itself), the
 *   manifest, the icons from assets/ and an unmodified local copy of office.js.
 *
 * To add a page, write a function `fooConfig(env, argv)` returning one configuration with
 * its own `name` and add it to the array at the bottom. Every configuration writes into
 * dist/ (`output.clean` is off so the configurations do not wipe each other's files).
 *
 *   npx webpack --mode production                # every configuration
 *   npx webpack --mode production --config-name addin
 */
const path = require("path");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");

const root = __dirname;
const officeDist = path.join(root, "node_modules", "@microsoft", "office-js", "dist");

/** Files of @microsoft/office-js copied unmodified (its licence allows only that). */
const officeFiles = [
  "office.js",
  "o15apptofilemappingtable.js",
  "custom-functions-runtime.js",
  "en-us/office_strings.js",
  "excel-web-16.00.js",
  "excel-web-16.00-core.js",
  "excel-win32-16.00.js",
  "excel-win32-16.01.js",
  "excel-win32-16.01-core.js",
  "excel-mac-16.00.js",
  "excel-mac-16.00-core.js",
];

/** Shared pieces every configuration may use. */
function common(env, argv) {
  const production = (argv && argv.mode) === "production";
  return {
    mode: production ? "production" : "development",
    devtool: production ? "source-map" : "cheap-module-source-map", // never eval: the pages forbid it (Content-Security-Policy)
    resolve: { extensions: [".ts", ".js"] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: { loader: "ts-loader", options: { transpileOnly: true, compilerOptions: { sourceMap: true } } },
        },
      ],
    },
    output: { path: path.join(root, "dist"), clean: false },
    performance: { hints: false },
  };
}

/** The custom-functions add-in: functions.js, functions.html, functions.json, manifest, icons. */
function addinConfig(env, argv) {
  const base = common(env, argv);
  return {
    ...base,
    name: "addin",
    entry: { functions: "./functions/functions.ts", taskpane: "./src/pane/taskpane.ts" },
    output: { ...base.output, filename: "[name].js" },
    plugins: [
      new CustomFunctionsMetadataPlugin({ input: "./functions/functions.ts", output: "functions.json" }),
      new HtmlWebpackPlugin({
        filename: "functions.html",
        template: "./functions/functions.html",
        chunks: ["functions"],
      }),
      // The diagram pane, the page the manifest's DefaultSettings names.
      new HtmlWebpackPlugin({ filename: "taskpane.html", template: "./src/pane/taskpane.html", chunks: ["taskpane"] }),
      new CopyWebpackPlugin({
        patterns: [
          { from: "assets/*.png", to: "assets/[name][ext]" },
          { from: "manifest.xml", to: "manifest.xml" },
          ...officeFiles.map((file) => ({
            from: path.join(officeDist, file),
            to: path.join("office-js", file),
            info: { minimized: true },
          })),
        ],
      }),
    ],
  };
}

/** The workbench: a standalone page with the demo workbook evaluated by the formula engine. */
function workbenchConfig(env, argv) {
  const base = common(env, argv);
  return {
    ...base,
    name: "workbench",
    entry: { workbench: "./src/workbench/main.ts" },
    output: { ...base.output, filename: "[name].js" },
    plugins: [
      new HtmlWebpackPlugin({ filename: "workbench.html", template: "./src/workbench/index.html", chunks: ["workbench"] }),
    ],
  };
}

module.exports = (env, argv) => [addinConfig(env, argv), workbenchConfig(env, argv)];
module.exports.workbenchConfig = workbenchConfig;
module.exports.addinConfig = addinConfig;
module.exports.common = common;
