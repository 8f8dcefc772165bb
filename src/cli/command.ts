import type {CliIo} from './io.js';

/** One CLI command. `help` is the full text printed by `tapwright <name> --help`. */
export interface Command {
  name: string;
  summary: string;
  help: string;
  run(args: string[], io: CliIo): Promise<number>;
}
