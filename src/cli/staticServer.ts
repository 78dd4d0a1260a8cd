/**
 * A small static file server for dist/: plain HTTP for tests, HTTPS with the project-local
 * development certificate for `npm start`. "/" opens the workbench. Only regular files under
 * the root are served (after resolving links), only to GET and HEAD.
 *
 * Every request gets a status code, never an exception (issue 14: one malformed escape such as
 * `/%` used to kill the process): a target that is not a plain path is 400, a URL over
 * MAX_URL_LENGTH is 414, other methods 405, a missing file 404, a read failure 500.
 *
 * Headers (see responseHeaders): no `Access-Control-Allow-Origin: *` (source maps carry the
 * whole source). Cross-origin reads are allowed only for the add-in's metadata and scripts and
 * only from the spreadsheet host's web origins, because Office on the web fetches
 * functions.json from its own origin (office-js#3970: "blocked by CORS policy" from
 * https://excel.officeapps.live.com; the custom-functions docs tip added in
 * office-js-docs-pr#602: "Server settings on the server that hosts the JSON file must have CORS
 * enabled ... in Excel Online"). The maintainers publish no list of those origins
 * (office-js-docs-pr#2956 suggests a filter such as *.live.com), so OFFICE_WEB_ORIGIN is
 * ours, from memory of the host's domains: confirm on a real host (DEVELOPERS.md).
 * HTML responses carry the pages' Content-Security-Policy plus `frame-ancestors` (the header
 * form of a frame restriction; X-Frame-Options cannot name several origins, and Office on the
 * web shows the add-in in an iframe from its own origins).
 */
import fs from "fs";
import http from "http";
import https from "https";
import path from "path";

const TYPES: Record<string, string> = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".map": "application/json; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".png": "image/png",
  ".svg": "image/svg+xml",
  ".xml": "application/xml; charset=utf-8",
  ".xlsx": "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
};

/** Longest request target served; longer is 414 (dist/ paths are all far shorter). */
export const MAX_URL_LENGTH = 2048;

/** Methods served. */
export const METHODS = ["GET", "HEAD"];

/**
 * The spreadsheet host's web origins that may read the add-in's metadata and scripts
 * cross-origin (see the file comment: from memory, to confirm on a real host).
 */
export const OFFICE_WEB_ORIGIN = /^https:\/\/([a-z0-9-]+\.)*(officeapps\.live\.com|office\.com|office365\.com|sharepoint\.com|microsoft365\.com|cloud\.microsoft)$/;

/** Frame ancestors allowed for the pages: our own origin and the web host's. */
export const FRAME_ANCESTORS = "'self' https://*.officeapps.live.com https://*.office.com https://*.office365.com https://*.sharepoint.com https://*.microsoft365.com https://*.cloud.microsoft";

/** The pages' policy (the same as each page's meta tag) plus frame-ancestors, which a meta tag cannot carry. */
export const PAGE_POLICY =
  "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data:; connect-src 'self'; object-src 'none'; base-uri 'none'; form-action 'none'; " +
  `frame-ancestors ${FRAME_ANCESTORS}`;

export interface TlsFiles {
  key: Buffer;
  cert: Buffer;
}

/** Files another origin may read: the add-in's metadata and scripts at the top level, never source maps. */
function crossOriginReadable(relative: string): boolean {
  return /^[^/]+\.(json|js)$/.test(relative);
}

/** The response headers for a served file (pure: tested directly). */
export function responseHeaders(relative: string, origin: string | undefined): Record<string, string> {
  const ext = path.extname(relative).toLowerCase();
  const headers: Record<string, string> = {
    "Content-Type": TYPES[ext] ?? "application/octet-stream",
    "Cache-Control": "no-store",
    "X-Content-Type-Options": "nosniff",
  };
  // No Referrer-Policy: office.js reads the referrer to tell which host it runs in; with
  // `no-referrer` the standalone pane's office.js took another path and framed a remote
  // telemetry page (seen in tests/hardening/network.test.ts).
  if (ext === ".html") headers["Content-Security-Policy"] = PAGE_POLICY;
  if (crossOriginReadable(relative)) {
    headers["Vary"] = "Origin";
    if (origin && OFFICE_WEB_ORIGIN.test(origin)) headers["Access-Control-Allow-Origin"] = origin;
  }
  return headers;
}

/** The file path a request target names under the root, or a status code for a bad target (pure). */
export function resolveTarget(base: string, target: string | undefined): { file: string; relative: string } | { status: number } {
  if (target === undefined || target.length === 0) return { status: 400 };
  if (target.length > MAX_URL_LENGTH) return { status: 414 };
  if (!target.startsWith("/")) return { status: 400 }; // "*", absolute-form or garbage
  const rawPath = target.split(/[?#]/, 1)[0];
  let decoded: string;
  try {
    decoded = decodeURIComponent(rawPath);
  } catch {
    return { status: 400 }; // malformed escape such as "/%" or "/%c0%ae"
  }
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\\]/.test(decoded)) return { status: 400 };
  const file = path.resolve(base, "." + decoded);
  if (!file.startsWith(base + path.sep)) return { status: 404 };
  return { file, relative: path.relative(base, file).split(path.sep).join("/") };
}

function plain(response: http.ServerResponse, status: number, extra: Record<string, string> = {}): void {
  if (response.headersSent) {
    response.destroy();
    return;
  }
  response.writeHead(status, { "Content-Type": "text/plain; charset=utf-8", "Cache-Control": "no-store", "X-Content-Type-Options": "nosniff", ...extra });
  response.end(`${status} ${http.STATUS_CODES[status] ?? ""}\n`);
}

export function createStaticServer(root: string, tls?: TlsFiles): http.Server {
  const base = path.resolve(root);
  const handler: http.RequestListener = (request, response) => {
    try {
      if (!METHODS.includes(request.method ?? "")) {
        plain(response, 405, { Allow: METHODS.join(", ") });
        return;
      }
      if (request.url === "/") {
        response.writeHead(302, { Location: "/workbench.html", "Cache-Control": "no-store" }).end();
        return;
      }
      const target = resolveTarget(base, request.url);
      if ("status" in target) {
        plain(response, target.status);
        return;
      }
      fs.realpath(target.file, (realError, real) => {
        fs.realpath(base, (baseError, realBase) => {
          if (realError || baseError || !real.startsWith(realBase + path.sep)) {
            plain(response, 404);
            return;
          }
          fs.stat(real, (statError, stat) => {
            if (statError || !stat.isFile()) {
              plain(response, 404);
              return;
            }
            const origin = typeof request.headers.origin === "string" ? request.headers.origin : undefined;
            response.writeHead(200, { ...responseHeaders(target.relative, origin), "Content-Length": String(stat.size) });
            if (request.method === "HEAD") {
              response.end();
              return;
            }
            const stream = fs.createReadStream(real);
            stream.on("error", () => response.destroy());
            stream.pipe(response);
          });
        });
      });
    } catch {
      plain(response, 500);
    }
  };
  const server = tls ? https.createServer(tls, handler) : http.createServer(handler);
  // A broken connection (bad TLS, malformed HTTP) closes that socket only, with a 400 where possible.
  server.on("clientError", (_error, socket) => {
    if (socket.writable) socket.end("HTTP/1.1 400 Bad Request\r\nConnection: close\r\n\r\n");
    else socket.destroy();
  });
  return server;
}

/** Starts listening; resolves with the port (pass 0 for any free port). */
export function listen(server: http.Server, port: number, host = "localhost"): Promise<number> {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      const address = server.address();
      resolve(typeof address === "object" && address ? address.port : port);
    });
  });
}
