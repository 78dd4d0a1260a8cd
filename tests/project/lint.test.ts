import { execFileSync } from "child_process";
import fs from "fs";
import path from "path";

const root = path.resolve(__dirname, "../..");
const eslintBin = path.join(root, "node_modules/eslint/bin/eslint.js");

function run(command: string, args: string[]): { ok: boolean; output: string } {
  try {
    const output = execFileSync(command, args, { cwd: root, encoding: "utf8", stdio: "pipe" });
    return { ok: true, output };
  } catch (error) {
    const e = error as { stdout?: string; stderr?: string };
    return { ok: false, output: `${e.stdout ?? ""}${e.stderr ?? ""}` };
  }
}

describe("project hygiene", () => {
  it("type-checks in strict mode", () => {
    const result = run(process.execPath, [path.join(root, "node_modules/typescript/bin/tsc"), "--noEmit", "-p", "tsconfig.json"]);
    expect(result.output).toBe("");
    expect(result.ok).toBe(true);
  });

  it("passes lint, including the rule that keeps host and DOM names out of src/core", () => {
    const result = run(process.execPath, [eslintBin, "."]);
    expect(result.output).toBe("");
    expect(result.ok).toBe(true);
  });

  it("the lint rule really rejects a host name in src/core", () => {
    const probe = path.join(root, "src/core/__lint_probe__.ts");
    fs.writeFileSync(probe, "export const probe = () => Office.context;\n");
    try {
      const result = run(process.execPath, [eslintBin, probe]);
      expect(result.ok).toBe(false);
      expect(result.output).toMatch(/src\/core is pure/);
    } finally {
      fs.unlinkSync(probe);
    }
  });
});
