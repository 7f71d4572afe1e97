/** Where the CLI writes, so commands can be tested without a terminal; and the usage error (exit 2). */
export interface Output {
  stdout(text: string): void;
  stderr(text: string): void;
}

/** The process's own streams. */
export const processOutput: Output = {
  stdout: (text) => void process.stdout.write(text),
  stderr: (text) => void process.stderr.write(text),
};

/** Bad usage of the command line: reported with the usage text, exit code 2. */
export class UsageError extends Error {
  override name = 'UsageError';
}
