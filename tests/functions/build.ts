/**
 * One production build of the add-in configuration for the tests, into a temp folder named
 * after a hash of its inputs: reruns with unchanged sources reuse it. Not a test file.
 */
import { createHash } from "crypto";
import * as fs from "fs";
import * as os from "os";
import { createRequire } from "module";
import * as path from "path";
import webpack from "webpack";

const root = path.resolve(__dirname, "../..");

function inputs(): string[] {
  const files: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(path.join(root, dir), { withFileTypes: true })) {
      const rel = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(rel);
      else files.push(rel);
    }
  };
  for (const dir of ["functions", "src", "assets"]) walk(dir);
  files.push("manifest.xml", "webpack.config.js", "package-lock.json");
  return files.sort();
}

function hashOfInputs(): string {
  const hash = createHash("sha256");
  for (const file of inputs()) {
    hash.update(file);
    hash.update(fs.readFileSync(path.join(root, file)));
  }
  return hash.digest("hex").slice(0, 16);
}

/** Builds (or reuses) the add-in bundle and returns the output folder. */
export async function buildAddin(): Promise<string> {
  const out = path.join(os.tmpdir(), `spanwise-addin-${hashOfInputs()}`);
  if (fs.existsSync(path.join(out, ".complete"))) return out;
  const configs = createRequire(__filename)(path.join(root, "webpack.config.js"))({}, { mode: "production" });
  const config = configs.find((c: { name?: string }) => c.name === "addin");
  config.output = { ...config.output, path: out };
  config.context = root;
  config.devtool = false;
  const previous = process.cwd();
  process.chdir(root);
  try {
    const stats = await new Promise<webpack.Stats>((resolve, reject) => webpack(config, (err, s) => (err || !s ? reject(err) : resolve(s))));
    if (stats.hasErrors()) throw new Error(stats.toString({ all: false, errors: true }));
  } finally {
    process.chdir(previous);
  }
  fs.writeFileSync(path.join(out, ".complete"), new Date().toISOString());
  return out;
}
