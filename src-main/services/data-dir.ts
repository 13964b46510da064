import { homedir } from 'node:os';
import { join } from 'node:path';

/**
 * The per-user data folder (recent files, recovery file): GPRIME_DATA_DIR when set, otherwise the
 * platform's usual place for application data.
 */
export function defaultDataDir(
  env: NodeJS.ProcessEnv = process.env,
  platform: NodeJS.Platform = process.platform,
): string {
  if (env.GPRIME_DATA_DIR) return env.GPRIME_DATA_DIR;
  if (platform === 'win32') return join(env.APPDATA ?? join(homedir(), 'AppData', 'Roaming'), 'gprime');
  if (platform === 'darwin') return join(homedir(), 'Library', 'Application Support', 'gprime');
  return join(env.XDG_DATA_HOME ?? join(homedir(), '.local', 'share'), 'gprime');
}
