// Placeholder until the workbench lands.
import type {CliIo} from '../cli/io.js';
export async function launch(_args: string[], io: CliIo): Promise<number> {
  io.err('tapwright: the workbench is not available in this build yet; see tapwright --help\n');
  return 2;
}
