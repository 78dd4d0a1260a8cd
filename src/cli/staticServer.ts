/**
 * A small static file server for dist/: plain HTTP for tests, HTTPS with the project-local
 * development certificate for `npm start`. "/" opens the workbench. Only files under the
 * root are served.
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

export interface TlsFiles {
  key: Buffer;
  cert: Buffer;
}

export function createStaticServer(root: string, tls?: TlsFiles): http.Server {
  const base = path.resolve(root);
  const handler: http.RequestListener = (request, response) => {
    const url = new URL(request.url ?? "/", "http://localhost");
    if (url.pathname === "/") {
      response.writeHead(302, { Location: "/workbench.html" }).end();
      return;
    }
    const file = path.resolve(base, "." + decodeURIComponent(url.pathname));
    if (!file.startsWith(base + path.sep) || !fs.existsSync(file) || !fs.statSync(file).isFile()) {
      response.writeHead(404, { "Content-Type": "text/plain" }).end("not found");
      return;
    }
    response.writeHead(200, {
      "Content-Type": TYPES[path.extname(file).toLowerCase()] ?? "application/octet-stream",
      "Cache-Control": "no-store",
      "Access-Control-Allow-Origin": "*",
    });
    fs.createReadStream(file).pipe(response);
  };
  return tls ? https.createServer(tls, handler) : http.createServer(handler);
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
