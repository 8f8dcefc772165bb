/**
 * The default tightening-method scatter factor from the settings, for a joint
 * whose --scatter and preset give none. Read without conf (a plain file read).
 */
import type {CliIo} from './io.js';
import {configDir} from '../store/paths.js';
import {readSettingsQuick} from '../store/settings-schema.js';

export function defaultScatter(io: CliIo): number {
  return readSettingsQuick(configDir(io.env)).scatterDefault;
}
