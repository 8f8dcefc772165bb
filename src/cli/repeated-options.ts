/**
 * Option shapes node:util parseArgs lets through or words in its own way:
 * an option given twice (parseArgs keeps the last value silently) and a value
 * given to an on/off option ("--json=x"). Called by parseOptions before parsing.
 */
import type {ParseArgsConfig} from 'node:util';
import {UsageError} from './io.js';

type OptionSpec = NonNullable<ParseArgsConfig['options']>;

/** Throws UsageError naming the option for a repeated option or a value given to an on/off option. */
export function refuseOptionShapes(args: readonly string[], options: OptionSpec): void {
  const seen = new Set<string>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === '--') break;
    let name: string | undefined;
    let inline = false;
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      name = eq > 0 ? a.slice(2, eq) : a.slice(2);
      inline = eq > 0;
    } else if (/^-[A-Za-z]$/.test(a)) {
      const short = a.slice(1);
      name = Object.keys(options).find(k => options[k]?.short === short);
    }
    const spec = name !== undefined ? options[name] : undefined;
    if (name === undefined || !spec) continue; // unknown options get parseArgs's check and our message
    if (spec.type === 'boolean' && inline) {
      throw new UsageError(`--${name} takes no value; write --${name} alone (got "${a.slice(0, 80)}")`, `--${name}`);
    }
    if (spec.type === 'string' && !inline) i++; // its value follows
    if (spec.multiple) continue;
    if (seen.has(name)) throw new UsageError(`--${name} is given more than once; give it once`, `--${name}`);
    seen.add(name);
  }
}
