/**
 * The development server under hostile requests (issue 14): every request gets a status code and
 * the server keeps answering; no `Access-Control-Allow-Origin: *`; a policy and frame-ancestors
 * on HTML; only GET and HEAD; nothing outside the root, links included. Loopback only, one
 * bounded scripted burst (a few hundred requests), raw sockets for what an HTTP client refuses
 * to send.
 */
import fs from "fs";
import http from "http";
import net from "net";
import os from "os";
import path from "path";
import { createStaticServer, listen, MAX_URL_LENGTH, OFFICE_WEB_ORIGIN, resolveTarget, responseHeaders } from "../../src/cli/staticServer";

let root: string;
let server: http.Server;
let port: number;

beforeAll(async () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-serve-"));
  root = path.join(dir, "dist");
  fs.mkdirSync(path.join(root, "help"), { recursive: true });
  fs.writeFileSync(path.join(root, "workbench.html"), "<!doctype html><title>w</title>");
  fs.writeFileSync(path.join(root, "functions.json"), '{"functions":[]}');
  fs.writeFileSync(path.join(root, "functions.js.map"), '{"sources":[]}');
  fs.writeFileSync(path.join(root, "help", "moment.html"), "<!doctype html><title>m</title>");
  fs.writeFileSync(path.join(dir, "secret.txt"), "outside the root");
  fs.symlinkSync(path.join(dir, "secret.txt"), path.join(root, "link.txt"));
  server = createStaticServer(root);
  port = await listen(server, 0, "127.0.0.1");
});

afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  fs.rmSync(path.dirname(root), { recursive: true, force: true });
});

function get(target: string, method = "GET", headers: Record<string, string> = {}): Promise<{ status: number; headers: http.IncomingHttpHeaders; body: string }> {
  return new Promise((resolve, reject) => {
    const request = http.request({ host: "127.0.0.1", port, path: target, method, headers, agent: false }, (response) => {
      let body = "";
      response.setEncoding("utf8");
      response.on("data", (chunk) => (body += chunk));
      response.on("end", () => resolve({ status: response.statusCode ?? 0, headers: response.headers, body }));
    });
    request.on("error", reject);
    request.end();
  });
}

/** Sends raw bytes; resolves with the status line's code (0 when the server closed without one). */
function raw(bytes: string): Promise<number> {
  return new Promise((resolve) => {
    const socket = net.connect(port, "127.0.0.1");
    let text = "";
    socket.setEncoding("latin1");
    socket.on("data", (chunk) => (text += chunk));
    socket.on("error", () => undefined);
    socket.on("close", () => resolve(Number(/^HTTP\/1\.[01] (\d{3})/.exec(text)?.[1] ?? 0)));
    socket.setTimeout(5000, () => socket.destroy());
    socket.end(bytes);
  });
}

describe("request targets (pure)", () => {
  const cases: [string, number][] = [
    ["/%", 400],
    ["/%c0%ae", 400],
    ["/%c0%ae%c0%ae/secret.txt", 400],
    ["/a%00b", 400],
    ["/..%5csecret.txt", 400],
    ["*", 400],
    ["http://evil.example/workbench.html", 400],
    ["", 400],
    ["/" + "a".repeat(MAX_URL_LENGTH), 414],
    ["/../secret.txt", 404],
    ["/%2e%2e/secret.txt", 404],
  ];
  test.each(cases.map(([target, status]) => [target.length > 40 ? `${target.slice(0, 12)}... (${target.length} characters)` : target, target, status] as const))("%s", (_label, target, status) => {
    expect(resolveTarget("/srv/dist", target)).toEqual({ status });
  });

  test("a plain path resolves under the root, the query dropped", () => {
    expect(resolveTarget("/srv/dist", "/help/moment.html?x=%")).toEqual({ file: "/srv/dist/help/moment.html", relative: "help/moment.html" });
  });
});

describe("response headers (pure)", () => {
  test("never a wildcard origin; the host's web origins may read the metadata, never a source map", () => {
    const office = "https://excel.officeapps.live.com";
    expect(OFFICE_WEB_ORIGIN.test(office)).toBe(true);
    expect(OFFICE_WEB_ORIGIN.test("https://officeapps.live.com.evil.example")).toBe(false);
    expect(OFFICE_WEB_ORIGIN.test("http://excel.officeapps.live.com")).toBe(false);
    expect(responseHeaders("functions.json", office)["Access-Control-Allow-Origin"]).toBe(office);
    expect(responseHeaders("functions.json", "https://evil.example")["Access-Control-Allow-Origin"]).toBeUndefined();
    expect(responseHeaders("functions.js.map", office)["Access-Control-Allow-Origin"]).toBeUndefined();
    expect(responseHeaders("workbench.html", office)["Access-Control-Allow-Origin"]).toBeUndefined();
  });

  test("HTML carries the policy with frame-ancestors; other types do not need it", () => {
    const html = responseHeaders("help/moment.html", undefined);
    expect(html["Content-Security-Policy"]).toMatch(/default-src 'self'; script-src 'self';/);
    expect(html["Content-Security-Policy"]).toMatch(/frame-ancestors 'self' https:\/\/\*\.officeapps\.live\.com/);
    expect(html["Content-Security-Policy"]).not.toMatch(/frame-ancestors[^;]*\s\*(\s|;|$)/);
    expect(html["X-Content-Type-Options"]).toBe("nosniff");
    // office.js reads the referrer to find its host: no Referrer-Policy (see staticServer.ts).
    expect(html["Referrer-Policy"]).toBeUndefined();
    expect(responseHeaders("functions.json", undefined)["Content-Security-Policy"]).toBeUndefined();
  });
});

describe("the server on loopback", () => {
  test("serves files with their headers, and nothing outside the root (links included)", async () => {
    const page = await get("/help/moment.html");
    expect(page.status).toBe(200);
    expect(page.headers["content-security-policy"]).toMatch(/frame-ancestors/);
    expect(page.headers["access-control-allow-origin"]).toBeUndefined();
    const head = await get("/functions.json", "HEAD");
    expect([head.status, head.body, head.headers["content-length"]]).toEqual([200, "", "16"]);
    expect((await get("/link.txt")).status).toBe(404);
    expect((await get("/../secret.txt")).status).toBe(404);
    expect((await get("/")).status).toBe(302);
  });

  test.each(["POST", "PUT", "DELETE", "OPTIONS", "PATCH", "TRACE", "PROPFIND"])("%s is 405 with Allow: GET, HEAD", async (method) => {
    const answer = await get("/functions.json", method);
    expect([answer.status, answer.headers.allow]).toEqual([405, "GET, HEAD"]);
  });

  test("a bounded burst of malformed requests: each gets a status code, and the server still answers", async () => {
    const malformed = [
      "GET /% HTTP/1.1\r\nHost: x\r\n\r\n",
      "GET /%c0%ae HTTP/1.1\r\nHost: x\r\n\r\n",
      "GET /%E0%A4%A HTTP/1.1\r\nHost: x\r\n\r\n",
      `GET /${"a".repeat(MAX_URL_LENGTH + 10)} HTTP/1.1\r\nHost: x\r\n\r\n`,
      `GET /${"%".repeat(10000)} HTTP/1.1\r\nHost: x\r\n\r\n`,
      "GET * HTTP/1.1\r\nHost: x\r\n\r\n",
      "GET http://evil.example/ HTTP/1.1\r\nHost: x\r\n\r\n",
      "BREW /functions.json HTTP/1.1\r\nHost: x\r\n\r\n",
      "GET /functions.json HTTP/9.9\r\nHost: x\r\n\r\n",
      "\u0000\u0001\u0002garbage\r\n\r\n",
      "GET / HTTP/1.1\r\nHost: x\r\nX-Long: " + "b".repeat(20000) + "\r\n\r\n",
      "GET /functions.json HTTP/1.1\r\nContent-Length: 5\r\nTransfer-Encoding: chunked\r\n\r\n",
      "POST /functions.json HTTP/1.1\r\nHost: x\r\nContent-Length: 3\r\n\r\nabc",
    ];
    const statuses: number[] = [];
    for (let round = 0; round < 15; round++) {
      statuses.push(...(await Promise.all(malformed.map(raw))));
    }
    // Each malformed request got a 4xx status line (never a dropped connection without one).
    expect(statuses.filter((s) => s < 400 || s > 499)).toEqual([]);
    expect(statuses).toHaveLength(15 * malformed.length);
    const after = await get("/functions.json");
    expect([after.status, after.body]).toEqual([200, '{"functions":[]}']);
  }, 60_000);
});
