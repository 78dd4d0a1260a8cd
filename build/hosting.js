/**
 * Where the add-in is served from, as build steps (plain CommonJS: webpack.config.js and the
 * tests both load it).
 *
 * - Development (`npm start`, `npm run build`): every URL is DEV_BASE, office.js is a local,
 *   unmodified copy under office-js/.
 * - Production (`npm run build -- --env base=https://host/path/`): the manifest and the
 *   functions metadata name that origin instead (no localhost left: rebaseText throws), and
 *   the pages load office.js and the custom-functions runtime from Microsoft's hosted
 *   location, which the documentation requires for published add-ins ("If you plan to publish
 *   your Office Add-in from AppSource, you must use this CDN reference. Local references are
 *   only appropriate for internal, development, and debugging scenarios": "Referencing the
 *   Office JavaScript API library", learn.microsoft.com/office/dev/add-ins/develop/
 *   referencing-the-javascript-api-for-office-library-from-its-cdn). Each page's policy then
 *   allows scripts from exactly that one origin besides its own.
 */
"use strict";

const DEV_BASE = "https://localhost:3000/";
const DEV_ORIGIN = "https://localhost:3000";
const OFFICE_CDN_ORIGIN = "https://appsforoffice.microsoft.com";
const OFFICE_CDN = `${OFFICE_CDN_ORIGIN}/lib/1/hosted/`;

/** Files the pages load from the Office library, local copy (development) and hosted name. */
const OFFICE_SCRIPTS = ["office.js", "custom-functions-runtime.js"];

/**
 * Checks a production base URL: https, no query or fragment, ending in "/". Returns it with
 * its origin (the manifest's AppDomain).
 */
function parseBase(text) {
  let url;
  try {
    url = new URL(String(text));
  } catch {
    throw new Error(`--env base must be an absolute https URL such as https://example.com/spanwise/, not "${text}"`);
  }
  if (url.protocol !== "https:") throw new Error(`--env base must use https (the hosts load add-ins only over HTTPS), not "${text}"`);
  if (url.search || url.hash || url.username || url.password) throw new Error(`--env base must be a plain folder URL without query, fragment or credentials, not "${text}"`);
  if (!url.pathname.endsWith("/")) throw new Error(`--env base must end with "/" (it is the folder holding manifest.xml), not "${text}"`);
  if (/^(localhost|127\.|\[::1\])/.test(url.hostname)) throw new Error(`--env base must be the production origin, not a loopback address ("${text}")`);
  return { base: url.href, origin: url.origin };
}

/** Rewrites the development base in a manifest or metadata text to `base`; throws if any localhost URL survives. */
function rebaseText(text, hosting, what) {
  const out = text.split(DEV_BASE).join(hosting.base).split(DEV_ORIGIN).join(hosting.origin);
  const left = /https?:\/\/(localhost|127\.0\.0\.1)[^"'<\s]*/i.exec(out);
  if (left) throw new Error(`${what}: a localhost URL is left after rebasing to ${hosting.base}: ${left[0]}`);
  return out;
}

/**
 * A page for production: the Office scripts from the hosted location and the policy's
 * script-src widened by exactly that origin. Throws when the page lacks what is replaced, so a
 * changed template cannot silently keep a local copy.
 */
function hostedPage(html, name) {
  let out = html;
  // The pages may be minified (html-webpack-plugin drops optional quotes in production).
  for (const file of OFFICE_SCRIPTS) {
    const local = new RegExp(`src=(["']?)office-js/${file.replace(/[.]/g, "\\.")}\\1(?=[\\s>])`, "g");
    out = out.replace(local, `src="${OFFICE_CDN}${file}"`);
  }
  if (/office-js\//.test(out)) throw new Error(`${name}: a local office-js/ reference is left`);
  if (out.includes(OFFICE_CDN)) {
    const policy = /(<meta[^>]+http-equiv=["']?Content-Security-Policy["']?[^>]+content="[^"]*script-src 'self')(;)/i;
    if (!policy.test(out)) throw new Error(`${name}: no Content-Security-Policy with "script-src 'self';" to extend`);
    out = out.replace(policy, `$1 ${OFFICE_CDN_ORIGIN}$2`);
  }
  return out;
}

/**
 * webpack plugin: in production (hosting given), rewrites the emitted manifest, metadata and
 * pages as above. Runs after the pages and copies are emitted.
 */
class HostingPlugin {
  constructor(hosting) {
    this.hosting = hosting;
  }
  apply(compiler) {
    const { Compilation, sources } = compiler.webpack;
    compiler.hooks.thisCompilation.tap("SpanwiseHosting", (compilation) => {
      compilation.hooks.processAssets.tap({ name: "SpanwiseHosting", stage: Compilation.PROCESS_ASSETS_STAGE_SUMMARIZE }, () => {
        if (!this.hosting) return;
        for (const name of Object.keys(compilation.assets)) {
          const text = () => compilation.assets[name].source().toString();
          if (name === "manifest.xml" || name === "functions.json") {
            compilation.updateAsset(name, new sources.RawSource(rebaseText(text(), this.hosting, name)));
          } else if (name.endsWith(".html")) {
            compilation.updateAsset(name, new sources.RawSource(hostedPage(text(), name)));
          }
        }
      });
    });
  }
}

module.exports = { DEV_BASE, DEV_ORIGIN, OFFICE_CDN, OFFICE_CDN_ORIGIN, OFFICE_SCRIPTS, parseBase, rebaseText, hostedPage, HostingPlugin };
