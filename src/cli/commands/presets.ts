// Placeholder until the owning work lands; replaced by the real command.
import type {Command} from '../command.js';
import {EXIT} from '../io.js';

export const command: Command = {
  name: 'presets',
  summary: '',
  help: 'tapwright presets: not available in this build yet.',
  async run(_args, io) {
    io.err('tapwright: presets is not available in this build yet\n');
    return EXIT.usage;
  },
};
