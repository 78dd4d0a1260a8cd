/**
 * One production build of the add-in (functions and pane configurations) for the tests, into a
 * temp folder named after a hash of its inputs and the build's env: reruns with unchanged
 * sources reuse it. `buildAddin()` is the development build (localhost, local office.js);
 * `buildAddin({ base })` the production build for that origin. Not a test file.
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
  for (const dir of ["functions", "src", "assets", "build"]) walk(dir);
  files.push("manifest.xml", "webpack.config.js", "package-lock.json", "tsconfig.json", "tsconfig.functions.json");
  return files.sort();
}

function hashOfInputs(env: Record<string, string>): string {
  const hash = createHash("sha256");
  hash.update(JSON.stringify(env));
  for (const file of inputs()) {
    hash.update(file);
    hash.update(fs.readFileSync(path.join(root, file)));
  }
  return hash.digest("hex").slice(0, 16);
}

/** Builds (or reuses) the add-in's functions and pane and returns the output folder. */
export async function buildAddin(env: Record<string, string> = {}): Promise<string> {
  const out = path.join(os.tmpdir(), `spanwise-addin-${hashOfInputs(env)}`);
  if (fs.existsSync(path.join(out, ".complete"))) return out;
  const load = createRequire(__filename);
  const config = load(path.join(root, "webpack.config.js"));
  const configs = [config.addinConfig(env, { mode: "production" }), config.paneConfig(env, { mode: "production" })].map((c) => ({
    ...c,
    output: { ...c.output, path: out },
    context: root,
    devtool: false as const,
  }));
  const previous = process.cwd();
  process.chdir(root);
  try {
    const stats = await new Promise<webpack.MultiStats>((resolve, reject) => webpack(configs, (err, s) => (err || !s ? reject(err) : resolve(s))));
    if (stats.hasErrors()) throw new Error(stats.toString({ all: false, errors: true }));
  } finally {
    process.chdir(previous);
  }
  fs.writeFileSync(path.join(out, ".complete"), new Date().toISOString());
  return out;
}
