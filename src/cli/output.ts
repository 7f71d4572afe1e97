/** Where the CLI writes, so commands can be tested without a terminal; and the errors a command ends with. */
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

/**
 * A path the command was given that it cannot use (a file where a folder belongs, a folder that
 * does not exist, no permission, a folder a build must not replace): one line, exit code 2. The
 * usage text would only hide the one line that matters.
 */
export class PathError extends Error {
  override name = 'PathError';
}
