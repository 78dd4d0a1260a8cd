/**
 * Writing an output file beside others without ever writing through a link: the bytes go to a
 * temporary file in the output's folder, created exclusively (O_CREAT | O_EXCL, and O_NOFOLLOW:
 * an existing name or a planted symbolic link makes the open fail instead of being followed)
 * under a name of 96 random bits, then renamed over the output (a rename replaces a link, it
 * never writes into its target). The output is checked against the input twice, by device and
 * inode after links are resolved: before anything is written and again just before the rename.
 */
import crypto from "crypto";
import fs from "fs";
import path from "path";

export class WriteRefused extends Error {}

function identity(file: string): { dev: number; ino: number } | undefined {
  try {
    const stat = fs.statSync(file);
    return { dev: stat.dev, ino: stat.ino };
  } catch {
    return undefined;
  }
}

function same(a: { dev: number; ino: number } | undefined, b: { dev: number; ino: number } | undefined): boolean {
  return a !== undefined && b !== undefined && a.dev === b.dev && a.ino === b.ino;
}

export function randomTemporaryName(out: string): string {
  return `.${path.basename(out)}.${crypto.randomBytes(12).toString("hex")}.tmp`;
}

/** Throws WriteRefused when `out` is (or links to) the input, or exists and `force` is off. */
export function checkOutput(out: string, input: string | undefined, force: boolean): void {
  const inputId = input === undefined ? undefined : identity(input);
  if (same(identity(out), inputId)) throw new WriteRefused(`the output ${out} is the input workbook (after following links): spanwise never writes over its input`);
  let exists = false;
  try {
    fs.lstatSync(out);
    exists = true;
  } catch {
    exists = false;
  }
  if (exists && !force) throw new WriteRefused(`${out} exists already: choose another --out, or add --force to replace it`);
}

export function writeFileSafely(out: string, bytes: Uint8Array, input: string | undefined, force: boolean, temporaryName: (out: string) => string = randomTemporaryName): void {
  checkOutput(out, input, force);
  const folder = fs.realpathSync(path.dirname(path.resolve(out)));
  const target = path.join(folder, path.basename(out));
  const temporary = path.join(folder, temporaryName(out));
  const flags = fs.constants.O_WRONLY | fs.constants.O_CREAT | fs.constants.O_EXCL | (fs.constants.O_NOFOLLOW ?? 0);
  const fd = fs.openSync(temporary, flags, 0o666);
  let renamed = false;
  try {
    let written = 0;
    while (written < bytes.length) written += fs.writeSync(fd, bytes, written, bytes.length - written);
    fs.fsyncSync(fd);
    fs.closeSync(fd);
    checkOutput(target, input, force);
    fs.renameSync(temporary, target);
    renamed = true;
  } finally {
    if (!renamed) {
      try {
        fs.closeSync(fd);
      } catch {
        // closed already
      }
      fs.rmSync(temporary, { force: true });
    }
  }
}
