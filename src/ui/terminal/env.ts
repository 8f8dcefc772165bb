/**
 * Decisions about the terminal made once at start-up from the environment and
 * the options: colour, ASCII mode, and whether the workbench can run at all.
 * Plain functions of their inputs so every rule is testable without a terminal.
 */
import {parseUnitSystem} from '../../app/units-option.js';

export interface TerminalEnv {
  env: Record<string, string | undefined>;
  stdinIsTTY: boolean;
  stdoutIsTTY: boolean;
}

export interface LaunchOptions {
  preset?: string;
  ascii: boolean;
  units?: 'si' | 'us';
  color?: boolean;
}

/**
 * Colour on or off. Precedence: --color/--no-color, then FORCE_COLOR
 * (0/false off, anything else on), then NO_COLOR (any non-empty value: off,
 * per no-color.org), then TAPWRIGHT_NO_COLOR, then TERM=dumb, then whether
 * stdout is a terminal. Ink's colour library ignores NO_COLOR, so the theme
 * passes no colour at all when this is false.
 */
export function wantsColor(t: TerminalEnv, flag?: boolean): boolean {
  if (flag !== undefined) return flag;
  const force = t.env.FORCE_COLOR;
  if (force !== undefined && force !== '') return !(force === '0' || force.toLowerCase() === 'false');
  if (t.env.NO_COLOR) return false;
  if (t.env.TAPWRIGHT_NO_COLOR) return false;
  if (t.env.TERM === 'dumb') return false;
  return t.stdoutIsTTY;
}

/** The first locale variable that is set, as the C library reads them. */
export function activeLocale(env: Record<string, string | undefined>): string {
  return env.LC_ALL || env.LC_CTYPE || env.LANG || '';
}

/**
 * ASCII borders and symbols: asked for (--ascii, TAPWRIGHT_ASCII=1), or the
 * locale is not UTF-8 (an unset locale is "C"), or a terminal type known not
 * to draw box characters.
 */
export function wantsAscii(t: TerminalEnv, flag: boolean): boolean {
  if (flag) return true;
  const own = t.env.TAPWRIGHT_ASCII;
  if (own !== undefined && own !== '') return !(own === '0' || own.toLowerCase() === 'false');
  if (!/utf-?8/i.test(activeLocale(t.env))) return true;
  return ['linux', 'dumb', 'vt100', 'vt220'].includes(t.env.TERM ?? '');
}

/** Why the interactive workbench cannot start here, or undefined when it can. */
export function whyNoWorkbench(t: TerminalEnv): string | undefined {
  if (!t.stdinIsTTY && !t.stdoutIsTTY) return 'standard input and output are not a terminal';
  if (!t.stdinIsTTY) return 'standard input is not a terminal';
  if (!t.stdoutIsTTY) return 'standard output is not a terminal';
  if (t.env.TERM === 'dumb') return 'TERM=dumb cannot move the cursor';
  return undefined;
}

export class LaunchUsageError extends Error {}

/** Options accepted with no command: --preset NAME, --ascii, --units si|us, --color/--no-color. */
export function parseLaunchArgs(args: string[]): LaunchOptions {
  const out: LaunchOptions = {ascii: false};
  for (let i = 0; i < args.length; i++) {
    const a = args[i] ?? '';
    const [name, inline] = a.includes('=') ? [a.slice(0, a.indexOf('=')), a.slice(a.indexOf('=') + 1)] : [a, undefined];
    const value = (): string => {
      const v = inline ?? args[++i];
      if (v === undefined || v === '') throw new LaunchUsageError(`${name} needs a value`);
      return v;
    };
    if (name === '--preset') out.preset = value();
    else if (name === '--ascii') out.ascii = true;
    else if (name === '--color') out.color = true;
    else if (name === '--no-color') out.color = false;
    else if (name === '--units') {
      try {
        out.units = parseUnitSystem(value());
      } catch (e) {
        throw new LaunchUsageError(e instanceof Error ? e.message : String(e));
      }
    } else {
      throw new LaunchUsageError(
        `unknown option ${name} for the workbench (accepted: --preset NAME, --ascii, --units si|us, --color, --no-color); commands: see tapwright --help`,
      );
    }
  }
  return out;
}
