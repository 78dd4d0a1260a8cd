/**
 * `npm run stop`: stops the server `npm start` recorded (only a live process named in the
 * record), removes the record, and removes the sideload registration (its plan is tested in
 * sideload.test.ts). The "server" here is a child process this test starts and always ends.
 */
import { spawn } from "child_process";
import fs from "fs";
import os from "os";
import path from "path";
import { recordedServer, stop } from "../../src/cli/stop";

function io() {
  let out = "";
  return { io: { stdout: { write: (s: string) => ((out += s), true) }, stderr: { write: () => true } } as never, text: () => out };
}

test("a record is read only when it names a process id and a port", () => {
  expect(recordedServer('{"pid": 4242, "port": 3000}')).toEqual({ pid: 4242, port: 3000 });
  for (const bad of [null, "", "{", '{"pid": "1", "port": 3000}', '{"pid": 1, "port": 3000}', '{"pid": 4242}', "[]"]) expect(recordedServer(bad)).toBeNull();
});

test("stops the recorded live process, removes the record, and says what it did; a second run has nothing to do", async () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-stop-"));
  const child = spawn(process.execPath, ["-e", "setInterval(() => {}, 1000)"], { stdio: "ignore" });
  const exited = new Promise<number | null>((resolve) => child.on("exit", (code, signal) => resolve(signal ? 0 : code)));
  try {
    const file = path.join(dir, "server.json");
    fs.writeFileSync(file, JSON.stringify({ pid: child.pid, port: 3999 }));
    const first = io();
    expect(await stop(first.io, file)).toBe(0);
    expect(first.text()).toMatch(new RegExp(`^Stopped the development server on port 3999 \\(process ${child.pid}\\)\\.\\n`));
    expect(first.text()).toMatch(/unsideload|sideload/);
    await exited;
    expect(fs.existsSync(file)).toBe(false);
    const second = io();
    await stop(second.io, file);
    expect(second.text()).toMatch(/^No development server recorded/);
  } finally {
    if (child.exitCode === null && child.signalCode === null) child.kill();
    fs.rmSync(dir, { recursive: true, force: true });
  }
});

test("a record of a process that is gone is removed, nothing is signalled", async () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-stop-"));
  const child = spawn(process.execPath, ["-e", ""], { stdio: "ignore" });
  await new Promise((resolve) => child.on("exit", resolve));
  const file = path.join(dir, "server.json");
  fs.writeFileSync(file, JSON.stringify({ pid: child.pid, port: 3000 }));
  const run = io();
  await stop(run.io, file);
  expect(run.text()).toMatch(/is no longer running/);
  expect(fs.existsSync(file)).toBe(false);
  fs.rmSync(dir, { recursive: true, force: true });
});

test("npm run stop and npm run validate exist", () => {
  const pkg = JSON.parse(fs.readFileSync(path.resolve(__dirname, "../../package.json"), "utf8"));
  expect(pkg.scripts.stop).toBe("node src/cli/bin/spanwise.js stop");
  expect(pkg.scripts.validate).toBe("node build/validate.js");
});
