// Placeholder until the owning work lands; replaced by the real command.
import type {Command} from '../command.js';
import {EXIT} from '../io.js';

export const command: Command = {
  name: 'screw',
  summary: '',
  help: 'tapwright screw: not available in this build yet.',
  async run(_args, io) {
    io.err('tapwright: screw is not available in this build yet\n');
    return EXIT.usage;
  },
};
