/**
 * Entry point shared by the bin, the single-file build and the tests:
 * `runCli(argv, io)` returns the exit code and never throws.
 */
import {COMMANDS} from './commands/index.js';
import {EXIT, UsageError, type CliIo} from './io.js';
import {CAUTION_LINES, cautionText} from '../core/cautions.js';
import {VERSION} from '../version.js';
import {printableMessage} from '../core/text-safety.js';

export function topHelp(): string {
  const width = Math.max(...COMMANDS.map(c => c.name.length));
  return [
    'tapwright - workbench for threaded joints',
    '',
    'Usage:',
    '  tapwright                     open the interactive workbench (in a terminal)',
    '  tapwright <command> [options] run one command; see tapwright <command> --help',
    '',
    'Commands:',
    ...COMMANDS.map(c => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    'Options:',
    '  --help, -h     this text',
    '  --version      print the version',
    '  --preset NAME  open the workbench on a saved or shipped preset',
    '  --ascii        workbench with ASCII borders and symbols',
    '  --units si|us  display units of the workbench (a bare number is read in them)',
    '  --color, --no-color  force colour on or off (NO_COLOR is honoured too)',
    '',
    'Exit codes: 0 ok; 2 bad input or usage; 3 computed, but a check failed;',
    '1 internal error.',
    'JSON output (--json) is always in SI units: mm, N, MPa, N·m.',
    '',
    cautionText(80),
    '',
  ].join('\n');
}

/** True when the command line asks for JSON output (--json, --json=true, --format json, --format=json). */
export function wantsJson(args: readonly string[]): boolean {
  for (let i = 0; i < args.length; i++) {
    const a = args[i] ?? '';
    if (a === '--json' || a === '--json=true' || a === '--format=json') return true;
    if (a === '--format' && args[i + 1] === 'json') return true;
  }
  return false;
}

/**
 * With --json a failure also prints one JSON document on stdout, so a script that
 * reads stdout always gets JSON: {error: {message, option, exitCode}, cautions}.
 */
function jsonError(message: string, option: string | undefined, exitCode: number): string {
  return `${JSON.stringify({error: {message, option: option ?? null, exitCode}, cautions: CAUTION_LINES}, null, 2)}\n`;
}

function reportError(e: unknown, io: CliIo, json = false): number {
  if (e instanceof UsageError) {
    // The message may echo input from a file or an argument: escaped, and long input cut.
    const message = printableMessage(e.message);
    io.err(`tapwright: ${message}
`);
    if (json) io.out(jsonError(message, e.option, EXIT.usage));
    return EXIT.usage;
  }
  const msg = printableMessage(e instanceof Error ? e.message : String(e));
  if (json) io.out(jsonError(`internal error: ${msg}`, undefined, EXIT.internal));
  io.err(`tapwright: internal error: ${msg}\nPlease report this with the command you ran.\n`);
  if (io.env.TAPWRIGHT_DEBUG && e instanceof Error && e.stack) io.err(`${e.stack}\n`);
  return EXIT.internal;
}

/** Run the CLI. `launchWorkbench` is injected by the bin so tests never start Ink. */
export async function runCli(
  argv: string[],
  io: CliIo,
  launchWorkbench?: (args: string[], io: CliIo) => Promise<number>,
): Promise<number> {
  try {
    const [first, ...rest] = argv;
    if (first === '--version' || first === '-V') {
      if (rest.length) throw new UsageError(`${first} takes nothing after it; got "${rest[0]}"`, first);
      io.out(`${VERSION}\n`);
      return EXIT.ok;
    }
    if (first === '--help' || first === '-h' || first === 'help') {
      if (first === 'help' && rest[0]) return runCli([rest[0], '--help'], io, launchWorkbench);
      io.out(topHelp());
      return EXIT.ok;
    }
    if (first === undefined || first.startsWith('-')) {
      if (!launchWorkbench) {
        io.err('tapwright: the workbench is not available here; use a command (see tapwright --help)\n');
        return EXIT.usage;
      }
      return await launchWorkbench(argv, io);
    }
    const entry = COMMANDS.find(c => c.name === first);
    if (!entry) {
      const near = COMMANDS.filter(c => c.name.startsWith(first.slice(0, 2))).map(c => c.name);
      throw new UsageError(
        `unknown command "${first}"${near.length ? `; did you mean ${near.join(' or ')}?` : ''} (commands: ${COMMANDS.map(c => c.name).join(', ')})`,
      );
    }
    const command = await entry.load();
    if (rest.includes('--help') || rest.includes('-h')) {
      // Every help text ends with the cautions, whatever the command, wrapped to 80 columns.
      const help = command.help.endsWith('\n') ? command.help : `${command.help}\n`;
      const raw = CAUTION_LINES.join('\n');
      io.out(help.includes(raw) ? help.replace(raw, cautionText(80)) : `${help}\n${cautionText(80)}\n`);
      return EXIT.ok;
    }
    return await command.run(rest, io);
  } catch (e) {
    return reportError(e, io, wantsJson(argv.slice(1)));
  }
}
