/**
 * Where tapwright keeps its files. One folder holds settings.json (conf),
 * presets.json (our own store), its lock, backups and the workbench draft.
 */
import os from 'node:os';
import path from 'node:path';

/**
 * The config folder: TAPWRIGHT_CONFIG_DIR when set, else the platform config
 * folder + "/tapwright" (Linux and others: $XDG_CONFIG_HOME or ~/.config;
 * macOS: ~/Library/Preferences; Windows: %APPDATA%\tapwright\Config).
 * No "-nodejs" suffix.
 */
export function configDir(env: Record<string, string | undefined>, platform: NodeJS.Platform = process.platform): string {
  const override = env.TAPWRIGHT_CONFIG_DIR?.trim();
  if (override) return path.resolve(override);
  const home = env.HOME?.trim() || env.USERPROFILE?.trim() || os.homedir();
  if (platform === 'darwin') return path.join(home, 'Library', 'Preferences', 'tapwright');
  if (platform === 'win32') {
    const appData = env.APPDATA?.trim() || path.join(home, 'AppData', 'Roaming');
    return path.join(appData, 'tapwright', 'Config');
  }
  const xdg = env.XDG_CONFIG_HOME?.trim();
  // The XDG spec says a relative XDG_CONFIG_HOME is invalid and must be ignored.
  const base = xdg && path.isAbsolute(xdg) ? xdg : path.join(home, '.config');
  return path.join(base, 'tapwright');
}

/** File names inside the config folder. */
export const FILES = {
  presets: 'presets.json',
  settings: 'settings.json',
  draft: 'draft.json',
} as const;

export function storeFile(dir: string): string {
  return path.join(dir, FILES.presets);
}

/** "2026-12-01T19-04-42-123Z": an ISO time that is a valid file name everywhere. */
export function fileStamp(at: Date = new Date()): string {
  return at.toISOString().replace(/[:.]/g, '-');
}
