/**
 * The `mechatlas` command: parses the command line and dispatches. Exit 0 clean, 1 errors found,
 * 2 bad usage (or a path that cannot be used), 3 an internal failure (exit-status.ts).
 */
import { parseArgs } from 'node:util';
import { buildCommand } from './build-command.ts';
import { checkCommand } from './check-command.ts';
import { deriveCommand } from './derive-command.ts';
import { exportCommand } from './export-command.ts';
import { fmtCommand } from './fmt-command.ts';
import { liveCommand } from './live-command.ts';
import { fitCommand } from './fit-command.ts';
import { newCommand } from './new-command.ts';
import { EXIT } from './exit-status.ts';
import { describeFileSystemError } from './file-system-error.ts';
import { PathError, processOutput, UsageError, type Output } from './output.ts';
import { toolVersion } from '../catalogue/index.ts';
import { escapeControlCharacters } from '../render/index.ts';

const USAGE = `usage: mechatlas <command> [options]

commands:
  check [DIR|FILE…] [--format text|json|markdown|sarif] [--base GITREF]
        [--approximation-threshold 0.1] [--no-cache] [--workers N]
                      check records (default folder content/mechanisms); --base keeps
                      the records changed since GITREF (markdown then shows each one
                      before → after, for a pull request); the threshold is the
                      relative error above which an approximation is reported invalid
  derive FILE [--no-cache]
                      print one record's derivation step by step
  fit FILE            fit one record's data (and its rivals beside it) step by step
  new ID [--dir DIR]  write a new record to fill in (default folder content/mechanisms)
  export --sbml ID|FILE [--out FILE]
                      write the record's mass-action model as SBML Level 3 Version 2
  fmt [DIR|FILE…] [--check]
                      put records in one layout (fields in the schema's order,
                      two-space indentation, quotes only where needed), keeping
                      every value and comment; --check writes nothing and exits 1
                      when a file would change
  build [--content DIR] [--out DIR] [--strict] [--force] [--no-cache] [--workers N]
                      build the catalogue site (default content/mechanisms into dist);
                      --strict fails when a record has errors; --force replaces a
                      non-empty folder that an earlier build did not make
  live [--content DIR] [--port 4321] [--host 127.0.0.1]
                      serve the catalogue on this computer while you write: saving
                      a record updates its page (law, verdicts, diagnostics), its
                      species and its system; Ctrl-C stops

  Derivations are kept in .mechatlas-cache/ in the working folder (safe to delete);
  --no-cache derives everything afresh; --workers sets the threads that derive
  records not in the cache (default one per core).

options:
  -h, --help          this text
  -v, --version       the version

exit status: 0 clean, 1 errors in the records, 2 bad usage or a path that cannot
be used, 3 an internal failure of mechatlas (please report it)
`;

/** Runs the command line and returns the exit code. */
export async function main(argv: readonly string[], out: Output = processOutput): Promise<number> {
  try {
    return await dispatch(argv, out);
  } catch (error) {
    if (error instanceof UsageError || isParseArgsError(error)) {
      out.stderr(`mechatlas: ${oneLine((error as Error).message)}\n\n${USAGE}`);
      return EXIT.usage;
    }
    const problem = error instanceof PathError ? error.message : describeFileSystemError(error);
    if (problem !== undefined) {
      out.stderr(`mechatlas: ${oneLine(problem)}\n`);
      return EXIT.usage;
    }
    out.stderr(internalFailure(error));
    return EXIT.internal;
  }
}

/** A message as one printable line: control characters (a newline, an escape sequence) escaped. */
function oneLine(text: string): string {
  return escapeControlCharacters(text);
}

/** What a crash of mechatlas itself says: one line, how to report it, the stack only on request. */
export function internalFailure(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  const stack = error instanceof Error && process.env['MECHATLAS_DEBUG'] ? `${error.stack}\n` : '';
  return (
    `mechatlas: internal failure: ${oneLine(message)}\n` +
    `  this is a fault in mechatlas ${toolVersion()}, not in your records; please report it to the\n` +
    `  mechatlas maintainers with the command you ran (MECHATLAS_DEBUG=1 prints the stack trace)\n` +
    stack
  );
}

async function dispatch(argv: readonly string[], out: Output): Promise<number> {
  const [command, ...rest] = argv;
  if (command === undefined || command === '-h' || command === '--help' || command === 'help') {
    out.stdout(USAGE);
    return command === undefined ? 2 : 0;
  }
  if (command === '-v' || command === '--version') {
    out.stdout(`${toolVersion()}\n`);
    return 0;
  }
  switch (command) {
    case 'check': {
      const { values, positionals } = parseArgs({
        args: rest,
        allowPositionals: true,
        options: {
          format: { type: 'string', default: 'text' },
          base: { type: 'string' },
          'approximation-threshold': { type: 'string' },
          ...PIPELINE_OPTIONS,
        },
      });
      const threshold = values['approximation-threshold'];
      return checkCommand(
        {
          targets: positionals,
          format: values.format,
          ...(values.base !== undefined && { base: values.base }),
          ...(threshold !== undefined && { approximationThreshold: Number(threshold) }),
          ...pipelineOptions(values),
        },
        out,
      );
    }
    case 'derive': {
      const { values, positionals } = parseArgs({
        args: rest,
        allowPositionals: true,
        options: { 'no-cache': PIPELINE_OPTIONS['no-cache'] },
      });
      if (positionals.length !== 1) throw new UsageError('derive takes exactly one record file');
      return deriveCommand(positionals[0]!, out, { cache: !values['no-cache'] });
    }
    case 'fit': {
      const { positionals } = parseArgs({ args: rest, allowPositionals: true, options: {} });
      if (positionals.length !== 1) throw new UsageError('fit takes exactly one record file');
      return fitCommand(positionals[0]!, out);
    }
    case 'new': {
      const { values, positionals } = parseArgs({
        args: rest,
        allowPositionals: true,
        options: { dir: { type: 'string', default: 'content/mechanisms' } },
      });
      if (positionals.length !== 1) throw new UsageError('new takes exactly one record id');
      return newCommand(positionals[0]!, values.dir, out);
    }
    case 'export': {
      const { values, positionals } = parseArgs({
        args: rest,
        allowPositionals: true,
        options: { sbml: { type: 'boolean', default: false }, out: { type: 'string' } },
      });
      if (!values.sbml) throw new UsageError('export needs a format: --sbml');
      if (positionals.length !== 1) throw new UsageError('export takes exactly one record id or file');
      return exportCommand(positionals[0]!, values.out, out);
    }
    case 'build': {
      const { values } = parseArgs({
        args: rest,
        allowPositionals: false,
        options: {
          content: { type: 'string', default: 'content/mechanisms' },
          out: { type: 'string', default: 'dist' },
          strict: { type: 'boolean', default: false },
          force: { type: 'boolean', default: false },
          ...PIPELINE_OPTIONS,
        },
      });
      return buildCommand(
        {
          content: values.content,
          out: values.out,
          strict: values.strict,
          force: values.force,
          ...pipelineOptions(values),
        },
        out,
      );
    }
    case 'fmt': {
      const { values, positionals } = parseArgs({
        args: rest,
        allowPositionals: true,
        options: { check: { type: 'boolean', default: false } },
      });
      return fmtCommand({ targets: positionals, check: values.check }, out);
    }
    case 'live': {
      const { values } = parseArgs({
        args: rest,
        allowPositionals: false,
        options: {
          content: { type: 'string', default: 'content/mechanisms' },
          port: { type: 'string', default: '4321' },
          host: { type: 'string', default: '127.0.0.1' },
        },
      });
      return liveCommand({ content: values.content, port: Number(values.port), host: values.host }, out);
    }
    default:
      throw new UsageError(`unknown command '${command}'`);
  }
}

/** The options of the commands that derive many records: the cache, and the threads. */
const PIPELINE_OPTIONS = {
  'no-cache': { type: 'boolean', default: false },
  workers: { type: 'string' },
} as const;

function pipelineOptions(values: { 'no-cache'?: boolean; workers?: string }): { cache: boolean; workers?: number } {
  const workers = values.workers === undefined ? undefined : Number(values.workers);
  if (workers !== undefined && !(Number.isInteger(workers) && workers >= 1 && workers <= 256))
    throw new UsageError('--workers must be a whole number of threads, 1 or more');
  return { cache: !values['no-cache'], ...(workers !== undefined && { workers }) };
}

function isParseArgsError(error: unknown): boolean {
  const code = (error as { code?: unknown } | null)?.code;
  return typeof code === 'string' && code.startsWith('ERR_PARSE_ARGS');
}
