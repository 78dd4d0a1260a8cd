/** What the commands write to, and the error that ends a command with a message and exit code. */
export interface Io {
  stdout: { write(text: string): unknown };
  stderr: { write(text: string): unknown; isTTY?: boolean };
}

/** A problem the user can fix: printed as "spanwise: <message>", with its exit code (2: usage, then the command's usage text). */
export class UsageError extends Error {
  constructor(
    message: string,
    readonly exitCode = 2,
    readonly usage?: string,
  ) {
    super(message);
    this.name = "UsageError";
  }
}
