/**
 * Help pages for the worksheet functions, generated from the same JSDoc that the metadata
 * generator reads (functions/functions.ts), so the host's short help and the page never
 * disagree. Plain CommonJS: webpack.config.js emits the pages (help/<id>.html and
 * support.html) and the tests read the same functions.
 *
 * In each @customfunction block:
 * - the leading text is the short description the host shows (at most HELP_LIMIT characters:
 *   its first sentence and an example);
 * - `@param` texts are the short argument help (at most HELP_LIMIT each);
 * - `@remarks` holds the full text, shown only on the page (the metadata generator ignores
 *   tags it does not know);
 * - `@helpurl` names the page, DEV_BASE + "help/" + lower-case id + ".html" (rebased for
 *   production with the rest of functions.json).
 *
 * The limit: the host's argument help is built for a line or two, and its function dialogs
 * take at most 255 characters per text (the host's long-standing limit for function and
 * argument descriptions: reported for custom functions as truncation in the Function
 * Arguments window, OfficeDev/office-js#2063; the 255 figure itself from memory of the
 * host's function-registration limits).
 */
"use strict";
const ts = require("typescript");

const HELP_LIMIT = 255;
const NAMESPACE = "SPAN";
const CAUTION =
  "Spanwise is an aid to a qualified engineer. Its results must be checked by that engineer, and the governing local codes and licensed practice decide every design.";

/** The conventions every function follows (the README's Conventions section, in short). */
const CONVENTIONS = [
  "x runs from the member's left end, in the length unit of spans.",
  "Loads act downward when positive; couples act clockwise when positive.",
  "Moment: sagging is positive. Shear: V = dM/dx, so a simple span's left reaction gives positive shear.",
  "Deflection is positive downward; slope = d(deflection)/dx, in radians.",
  "Reactions: vertical force up positive; moment reaction counter-clockwise positive.",
  "Where V or M jumps (point load, couple, support) a function returns the value just right of x; at the member's right end, the value just left. SPAN.DIAGRAM gives both sides as two rows.",
  "Units are yours, consistently: results come out in the units that went in, or label them with the optional units argument (pairs such as length=ft, force=kip, EI=kip*in^2, deflection=in).",
  "With units labelled: spans, x and load positions in the length unit, loads in the force unit (force/length for distributed loads, force x length for couples), EI in its unit; results in the length and force units (moments in force x length, deflection in its own unit, default the length unit). length and force are required when any label is given.",
  "Without EI the member is taken as uniform: forces and moments of indeterminate members need only relative stiffness; slope and deflection need EI and return #N/A saying so.",
  "Load table: one load per row: type (point, moment, udl, linear), magnitude, x start (blank = 0), x end (blank = member end), magnitude at end (linear only), case label. Wholly blank rows are skipped.",
  "Load notation, a whole load table in one cell, loads joined by ';': point P at X | moment C at X | udl W [from A] [to B] | linear W1 to W2 [from A] [to B], each with an optional case label last.",
  "Supports: one entry per node (spans + 1): pin, fixed, free, hinge, or a number for a vertical spring stiffness (force/length); blank = every node pin.",
];

const ERRORS =
  "Bad input never gives a number: it gives #VALUE! (or #N/A for a result that cannot exist) with a message naming the argument, row and problem. On the desktop host the message shows when you hover over or select the error indicator beside the cell; the Spanwise pane (Beam diagrams on the Home tab) shows the message of the selected cell.";

function text(comment) {
  return (ts.getTextOfJSDocComment(comment) || "").replace(/\s+/g, " ").trim();
}

/** Every @customfunction block of a source text: id, export, short description, parameters, remarks, returns, helpurl. */
function readFunctionDocs(source, fileName = "functions.ts") {
  const file = ts.createSourceFile(fileName, source, ts.ScriptTarget.Latest, true, ts.ScriptKind.TS);
  const docs = [];
  for (const statement of file.statements) {
    if (!ts.isFunctionDeclaration(statement) || !statement.name) continue;
    const jsDoc = (statement.jsDoc || [])[0];
    if (!jsDoc) continue;
    const tags = jsDoc.tags || [];
    const tag = (name) => tags.find((t) => t.tagName.escapedText.toString().toLowerCase() === name);
    const custom = tag("customfunction");
    if (!custom) continue;
    const id = text(custom.comment) || statement.name.text.toUpperCase();
    docs.push({
      id,
      exportName: statement.name.text,
      description: text(jsDoc.comment),
      remarks: tag("remarks") ? text(tag("remarks").comment) : "",
      returns: tag("returns") ? text(tag("returns").comment) : "",
      helpUrl: tag("helpurl") ? text(tag("helpurl").comment) : "",
      params: tags
        .filter((t) => ts.isJSDocParameterTag(t))
        .map((t) => ({ name: t.name.getText(file).replace(/^\[|\]$/g, ""), optional: t.isBracketed, text: text(t.comment) })),
    });
  }
  return docs;
}

/** The page name of a function id. */
function helpFile(id) {
  return `help/${id.toLowerCase()}.html`;
}

function escape(value) {
  return String(value).replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

/** The worksheet examples in a text: each "Example: =SPAN...." up to the end of the sentence list. */
function examplesIn(value) {
  const out = [];
  const re = /Examples?: (=SPAN\.[A-Z]+\((?:[^()"]|"[^"]*"|\([^()]*\))*\))/g;
  let match;
  while ((match = re.exec(value))) out.push(match[1]);
  return out;
}

const STYLE =
  "body{font:15px/1.5 system-ui,sans-serif;max-width:52em;margin:1.5em auto;padding:0 1em;color:#23262b;background:#fbfbf8}" +
  "pre,code{font:13px ui-monospace,monospace}pre{background:#efefe8;padding:.5em;overflow-x:auto;white-space:pre-wrap}" +
  "table{border-collapse:collapse}td,th{border-top:1px solid #d9d9d0;padding:.3em .5em;text-align:left;vertical-align:top}" +
  ".caution{border-left:4px solid #c9a227;background:rgba(201,162,39,.12);padding:.4em .8em}";

function page(title, body) {
  return [
    "<!doctype html>",
    '<html lang="en">',
    "<head>",
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src 'self'; base-uri 'none'; form-action 'none'">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escape(title)}</title>`,
    `<style>${STYLE}</style>`,
    "</head>",
    "<body>",
    `<p class="caution"><strong>Caution.</strong> ${escape(CAUTION)}</p>`,
    ...body,
    "</body>",
    "</html>",
    "",
  ].join("\n");
}

/** The help page of one function. */
function helpPage(doc) {
  const call = `=${NAMESPACE}.${doc.id}(${doc.params.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ")})`;
  const examples = [...examplesIn(doc.description), ...examplesIn(doc.remarks)];
  return page(`${NAMESPACE}.${doc.id}: Spanwise help`, [
    `<h1>${NAMESPACE}.${escape(doc.id)}</h1>`,
    `<p>${escape(doc.description.replace(/\s*Example: =.*$/, ""))}</p>`,
    "<h2>Syntax</h2>",
    `<pre>${escape(call)}</pre>`,
    "<h2>Arguments</h2>",
    "<table>",
    ...doc.params.map((p) => `<tr><th><code>${escape(p.name)}</code></th><td>${p.optional ? "optional" : "required"}</td><td>${escape(p.text)}</td></tr>`),
    "</table>",
    "<h2>Result</h2>",
    `<p>${escape(doc.returns)}</p>`,
    ...(doc.remarks ? ["<h2>Details</h2>", `<p>${escape(doc.remarks)}</p>`] : []),
    "<h2>Examples</h2>",
    ...examples.map((e) => `<pre>${escape(e)}</pre>`),
    "<h2>Conventions</h2>",
    "<ul>",
    ...CONVENTIONS.map((c) => `<li>${escape(c)}</li>`),
    "</ul>",
    "<h2>Errors</h2>",
    `<p>${escape(ERRORS)}</p>`,
    '<p><a href="../support.html">All Spanwise functions and support</a></p>',
  ]);
}

/** The support page: what the add-in is, every function with its page, where messages show, how to report a problem. */
function supportPage(docs) {
  return page("Spanwise support", [
    "<h1>Spanwise support</h1>",
    "<p>Spanwise adds worksheet functions in the SPAN namespace for exact beam analysis (reactions, shear, moment, slope, deflection, envelopes, influence lines, moving loads, sections and checks), and a Beam diagrams pane on the Home tab.</p>",
    "<h2>Functions</h2>",
    "<ul>",
    ...docs.map((d) => `<li><a href="${escape(helpFile(d.id))}">${NAMESPACE}.${escape(d.id)}</a>: ${escape(d.description.replace(/\s*Example: =.*$/, ""))}</li>`),
    "</ul>",
    "<h2>Error messages</h2>",
    `<p>${escape(ERRORS)}</p>`,
    "<h2>When the functions do not appear</h2>",
    "<p>The host caches the add-in's function list: after an update, close and reopen the workbook (on the desktop hosts, restart the application) before new functions or argument help show. If SPAN functions show #NAME?, the add-in is not loaded: open Beam diagrams once, or add the add-in again from the host's add-in dialog.</p>",
    "<h2>Reporting a problem</h2>",
    "<p>Tell whoever deployed Spanwise in your organisation the formula, the cell values it reads, what you expected and the message shown. Results are never to be used without an engineer's check.</p>",
  ]);
}

module.exports = { HELP_LIMIT, NAMESPACE, CAUTION, CONVENTIONS, readFunctionDocs, helpFile, helpPage, supportPage, examplesIn };

/** webpack plugin: emits help/<id>.html for every function of `input` and support.html. */
class HelpPagesPlugin {
  constructor(input) {
    this.input = input;
  }
  apply(compiler) {
    const fs = require("fs");
    const { Compilation, sources } = compiler.webpack;
    compiler.hooks.thisCompilation.tap("SpanwiseHelp", (compilation) => {
      compilation.fileDependencies.add(this.input);
      compilation.hooks.processAssets.tap({ name: "SpanwiseHelp", stage: Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL }, () => {
        const docs = readFunctionDocs(fs.readFileSync(this.input, "utf8"), this.input);
        if (docs.length === 0) compilation.errors.push(new compiler.webpack.WebpackError(`${this.input}: no @customfunction blocks for the help pages`));
        for (const doc of docs) compilation.emitAsset(helpFile(doc.id), new sources.RawSource(helpPage(doc)), { minimized: true });
        compilation.emitAsset("support.html", new sources.RawSource(supportPage(docs)), { minimized: true });
      });
    });
  }
}

module.exports.HelpPagesPlugin = HelpPagesPlugin;
