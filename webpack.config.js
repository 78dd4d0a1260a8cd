/* eslint-disable */
/**
 * Build of every page Spanwise ships, as an exported array of webpack configurations.
 *
 * - addinConfig ("addin"): the custom-functions bundle (functions.js + functions.html) with the
 *   generated functions.json (custom-functions-metadata-plugin writes it from the JSDoc in
 *   functions/functions.ts and appends the CustomFunctions.associate calls itself), the help
 *   pages and support page generated from the same JSDoc (build/helpPages.js), the manifest,
 *   the icons and, in development, an unmodified local copy of office.js.
 * - paneConfig ("pane"): the diagram pane (taskpane.js + taskpane.html).
 * - workbenchConfig ("workbench"): the standalone workbench (development only: it bundles the
 *   GPL-3.0 formula engine, which is not part of the add-in).
 *
 * Language levels (tests/functions/languageLevel.test.ts parses the bundles at these levels):
 * - functions.js: ECMAScript 2016. With separate runtimes, Windows runs it in the
 *   JavaScript-only custom-functions runtime, which the maintainers state supports ECMAScript
 *   2016 (OfficeDev/office-js-docs-pr#4496). TypeScript compiles to ES2016
 *   (tsconfig.functions.json also type-checks the entry against the ES2016 library), and
 *   `target: ["web", "es2016"]` keeps webpack's own runtime code at that level too.
 * - taskpane.js: ECMAScript 2017. The pane runs in the host's webview: Edge WebView2 or the
 *   legacy EdgeHTML control on Windows, Safari's WKWebView on the Mac, the browser on the
 *   web ("Browsers and webview controls used by Office Add-ins",
 *   learn.microsoft.com/office/dev/add-ins/concepts/browsers-used-by-office-web-add-ins);
 *   all of them run ES2017. Older Windows and volume-licensed Office through 2019 may still
 *   use Trident (Internet Explorer 11, ES5), for which the documentation recommends, but
 *   does not require, at least a graceful failure message ("Support older Microsoft webviews
 *   and Office versions", learn.microsoft.com/office/dev/add-ins/develop/support-ie-11):
 *   the pane is not built for Trident; the functions, which do not run in a webview on
 *   Windows, are unaffected.
 * - workbench.js: the developer's own browser (ES2020, unchanged).
 *
 * Size of functions.js: tsconfig.functions.json compiles the functions' modules as ES modules
 * (the other bundles stay CommonJS), so a production build concatenates them into one scope
 * (webpack's module concatenation, on by default in production) and the minifier sees every
 * binding: about a quarter smaller than the same code as CommonJS modules with their export
 * objects and interop. tests/project/bundleSize.test.ts keeps it so, and keeps the README's
 * figure equal to the built size.
 *
 * Production: `npm run build -- --env base=https://host/path/` writes release/ for that origin
 * (build/hosting.js: manifest and metadata rebased, office.js from its hosted location, the
 * policy widened by exactly that origin, no workbench, no local office.js, no screenshots).
 *
 * To add a page, write a function `fooConfig(env, argv)` returning one configuration with
 * its own `name` and add it to the array at the bottom.
 *
 *   npx webpack --mode production                # every configuration, into dist/
 *   npx webpack --mode production --config-name addin
 *   npx webpack --mode production --env base=https://example.com/spanwise/   # into release/
 */
const fs = require("fs");
const path = require("path");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");
const { HostingPlugin, parseBase } = require("./build/hosting");
const { HelpPagesPlugin } = require("./build/helpPages");

const root = __dirname;
const officeDist = path.join(root, "node_modules", "@microsoft", "office-js", "dist");
const functionsSource = path.join(root, "functions", "functions.ts");

/** Files of @microsoft/office-js copied unmodified (its licence allows only that); development builds only. */
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

/** The production hosting from `--env base=...`, or null for development. */
function hostingOf(env) {
  return env && env.base ? parseBase(env.base) : null;
}

/** Output folder: dist/ for development, release/ (or --env out=...) for production. */
function outputPath(env) {
  if (!hostingOf(env)) return path.join(root, "dist");
  return path.resolve(root, (env && env.out) || "release");
}

/** Shared pieces every configuration may use; `level` is the ECMAScript target of the bundle. */
function common(env, argv, level = "es2020", tsconfig = "tsconfig.json") {
  const production = (argv && argv.mode) === "production";
  return {
    mode: production ? "production" : "development",
    target: ["web", level],
    // never eval: the pages forbid it (Content-Security-Policy); no source maps in a hosted
    // production build (they would publish the whole source beside the add-in).
    devtool: hostingOf(env) ? false : production ? "source-map" : "cheap-module-source-map",
    resolve: { extensions: [".ts", ".js"] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: {
            loader: "ts-loader",
            options: { transpileOnly: true, configFile: path.join(root, tsconfig), compilerOptions: { sourceMap: true, noEmit: false, target: level.toUpperCase() } },
          },
        },
      ],
    },
    output: { path: outputPath(env), clean: false },
    performance: { hints: false },
  };
}

/** The custom-functions add-in: functions.js, functions.html, functions.json, help, manifest, icons. */
function addinConfig(env, argv) {
  const hosting = hostingOf(env);
  const base = common(env, argv, "es2016", "tsconfig.functions.json");
  return {
    ...base,
    name: "addin",
    // es2016.ts first: the few newer built-ins the shared code calls, where the runtime lacks them.
    entry: { functions: ["./functions/es2016.ts", "./functions/functions.ts"] },
    // Written on every build even when unchanged (webpack skips identical files by default), so
    // a build is newer than every source it read: the targets bench refuses an older bundle.
    output: { ...base.output, filename: "[name].js", compareBeforeEmit: false },
    plugins: [
      new CustomFunctionsMetadataPlugin({ input: "./functions/functions.ts", output: "functions.json" }),
      new HtmlWebpackPlugin({
        filename: "functions.html",
        template: "./functions/functions.html",
        chunks: ["functions"],
      }),
      new HelpPagesPlugin(functionsSource),
      new CopyWebpackPlugin({
        patterns: [
          // Only the icons: the screenshots in assets/ are documentation, not add-in files.
          { from: "assets/icon-*.png", to: "assets/[name][ext]" },
          { from: "manifest.xml", to: "manifest.xml" },
          ...(hosting
            ? []
            : officeFiles.map((file) => ({
                from: path.join(officeDist, file),
                to: path.join("office-js", file),
                info: { minimized: true },
              }))),
        ],
      }),
      new HostingPlugin(hosting),
    ],
  };
}

/** Packages bundled into the pane's PDF chunk besides pdf-lib, with their licence files. */
const pdfLicences = [
  ["@pdf-lib/standard-fonts", "@pdf-lib/standard-fonts/LICENSE.md"],
  ["@pdf-lib/upng", "@pdf-lib/upng/LICENSE"],
  ["pako", "pako/LICENSE"],
  ["tslib", "pdf-lib/node_modules/tslib/LICENSE.txt"],
];

/** The diagram pane, the page the manifest's DefaultSettings names. */
function paneConfig(env, argv) {
  const hosting = hostingOf(env);
  const base = common(env, argv, "es2017");
  // ES modules in the pane, so that `import()` of the PDF writer stays a chunk of its own
  // (report-pdf.js, with pdf-lib), loaded only when a PDF report is made.
  base.module.rules[0].use.options.compilerOptions.module = "es2020";
  return {
    ...base,
    name: "pane",
    entry: { taskpane: "./src/pane/taskpane.ts" },
    // publicPath "": the PDF chunk loads beside taskpane.html; webpack's automatic public path
    // would probe for importScripts (a worker API the pane never uses; tests/hardening/network.test.ts).
    output: { ...base.output, filename: "[name].js", chunkFilename: "[name].js", publicPath: "" },
    // One entry: no shared chunks to split out; the PDF writer and pdf-lib stay one file.
    optimization: { splitChunks: false },
    plugins: [
      new HtmlWebpackPlugin({ filename: "taskpane.html", template: "./src/pane/taskpane.html", chunks: ["taskpane"] }),
      // report-pdf.js bundles pdf-lib and what it brings: their licence notices ship beside it.
      new CopyWebpackPlugin({
        patterns: [
          {
            from: path.join(root, "node_modules", "pdf-lib", "LICENSE.md"),
            to: "report-pdf.js.LICENSE.txt",
            transform: (content) =>
              [["pdf-lib", content.toString()], ...pdfLicences.map(([name, file]) => [name, fs.readFileSync(path.join(root, "node_modules", file), "utf8")])]
                .map(([name, text]) => `${name}\n\n${text.trim()}\n`)
                .join("\n----\n\n"),
          },
        ],
      }),
      new HostingPlugin(hosting),
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
    // jszip's browser file (dist/jszip.min.js) inlines the `setimmediate` polyfill, which builds
    // functions from text and probes for workers; the page's policy allows neither
    // (tests/hardening/network.test.ts). So the workbench bundles jszip's own modules, with a
    // function-only shim of ours for setimmediate and no Node stream (jszip then uses its
    // browser paths only: support.nodestream is false).
    resolve: {
      ...base.resolve,
      alias: {
        jszip$: path.join(root, "node_modules/jszip/lib/index.js"),
        setimmediate: path.join(root, "src/workbench/files/setImmediate.ts"),
      },
      fallback: { stream: false },
    },
    plugins: [
      new HtmlWebpackPlugin({ filename: "workbench.html", template: "./src/workbench/index.html", chunks: ["workbench"] }),
    ],
  };
}

module.exports = (env, argv) => {
  if (hostingOf(env)) {
    // A production build starts from an empty folder, so nothing from an earlier build ships.
    fs.rmSync(outputPath(env), { recursive: true, force: true });
    return [addinConfig(env, argv), paneConfig(env, argv)];
  }
  return [addinConfig(env, argv), paneConfig(env, argv), workbenchConfig(env, argv)];
};
module.exports.workbenchConfig = workbenchConfig;
module.exports.addinConfig = addinConfig;
module.exports.paneConfig = paneConfig;
module.exports.common = common;
module.exports.outputPath = outputPath;
