/**
 * The runtime dependencies Spanwise ships, with their licences read from
 * node_modules/<name>/package.json: package.json "dependencies", and every package webpack
 * bundles into the shipped pages (found from a production build's module list). Not a test file.
 */
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import webpack from "webpack";

const ROOT = path.resolve(__dirname, "../..");

export interface Dependency {
  name: string;
  version: string;
  licence: string;
  why: string;
}

/** Package name of a file under node_modules (scoped names kept), or null. */
export function packageOf(file: string): string | null {
  const match = /node_modules[\\/]((?:@[^\\/]+[\\/])?[^\\/]+)/.exec(file.split(/node_modules[\\/](?=.*node_modules)/).pop() ?? file);
  return match ? match[1].replace(/\\/g, "/") : null;
}

/** Packages bundled into the production pages (every configuration of webpack.config.js). */
export async function bundledPackages(): Promise<Map<string, string[]>> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const configs = require(path.join(ROOT, "webpack.config.js"))({}, { mode: "production" }) as webpack.Configuration[];
  const out = fs.mkdtempSync(path.join(os.tmpdir(), "spanwise-deps-"));
  const stats = await new Promise<webpack.MultiStats>((resolve, reject) =>
    webpack(
      configs.map((c): webpack.Configuration => ({ ...c, context: ROOT, devtool: false as const, output: { ...c.output, path: out }, optimization: { minimize: false } })),
      (err: Error | null | undefined, s: webpack.MultiStats | undefined) => (err || !s ? reject(err) : resolve(s)),
    ),
  );
  fs.rmSync(out, { recursive: true, force: true });
  if (stats.hasErrors()) throw new Error(stats.toString("errors-only"));
  const found = new Map<string, string[]>();
  for (const child of stats.stats) {
    for (const module of child.compilation.modules) {
      const resource = (module as { resource?: string }).resource;
      const name = resource ? packageOf(resource) : null;
      if (!name) continue;
      const pages = found.get(name) ?? [];
      if (!pages.includes(child.compilation.name ?? "")) pages.push(child.compilation.name ?? "");
      found.set(name, pages);
    }
  }
  return found;
}

export function licenceOf(name: string): { version: string; licence: string } {
  const pkg = JSON.parse(fs.readFileSync(path.join(ROOT, "node_modules", name, "package.json"), "utf8"));
  const licence = typeof pkg.license === "string" ? pkg.license : pkg.license?.type ?? (Array.isArray(pkg.licenses) ? pkg.licenses.map((l: { type: string }) => l.type).join(" OR ") : "UNKNOWN");
  return { version: pkg.version, licence };
}

export async function runtimeDependencies(): Promise<Dependency[]> {
  const pkg = JSON.parse(fs.readFileSync(path.join(ROOT, "package.json"), "utf8"));
  const list = new Map<string, string>();
  for (const name of Object.keys(pkg.dependencies ?? {})) list.set(name, "package.json dependency");
  for (const [name, pages] of await bundledPackages()) {
    const why = `bundled into the ${pages.join(" and ")} page${pages.length > 1 ? "s" : ""}`;
    list.set(name, list.has(name) ? `${list.get(name)}; ${why}` : why);
  }
  return [...list.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([name, why]) => ({ name, ...licenceOf(name), why }));
}
