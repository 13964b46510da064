import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const ROOT = resolve(import.meta.dirname, '..', '..');

/** The chromium flags our CI machines need (Debian chromium, no sandbox, no network chatter). */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
}

export interface ShellProcess {
  url: string;
  proc: ChildProcess;
  /** stops the shell (SIGTERM, or SIGKILL to simulate a crash) and waits for it to exit */
  stop(signal?: NodeJS.Signals): Promise<void>;
}

/** A temporary workspace folder and data folder for one run. */
export function tempFolders(): { workspace: string; dataDir: string; remove(): void } {
  const base = mkdtempSync(join(tmpdir(), 'gprime-e2e-'));
  return {
    workspace: join(base, 'sites'),
    dataDir: join(base, 'data'),
    remove: () => rmSync(base, { recursive: true, force: true }),
  };
}

/** Starts `npm run serve`'s entry (src-main/shell/serve.ts) and waits for the address it prints. */
export function startShell(workspace: string, dataDir: string, timeoutMs = 120_000): Promise<ShellProcess> {
  const proc = spawn(
    process.execPath,
    ['--import', 'tsx', 'src-main/shell/serve.ts', '--workspace', workspace, '--data-dir', dataDir],
    {
      cwd: ROOT,
      stdio: ['ignore', 'pipe', 'pipe'],
      env: { ...process.env, GPRIME_DATA_DIR: dataDir },
    },
  );
  let out = '',
    err = '';
  const exited = new Promise<void>((done) => proc.once('exit', () => done()));
  const stop = async (signal: NodeJS.Signals = 'SIGTERM') => {
    if (proc.exitCode === null && proc.signalCode === null) proc.kill(signal);
    await exited;
  };
  return new Promise((done, fail) => {
    const timer = setTimeout(() => {
      void stop('SIGKILL');
      fail(new Error(`the shell printed no address in ${timeoutMs} ms\n${out}\n${err}`));
    }, timeoutMs);
    proc.stderr!.on('data', (b: Buffer) => {
      err += b.toString();
    });
    proc.stdout!.on('data', (b: Buffer) => {
      out += b.toString();
      const m = /gprime workspace: (http:\/\/127\.0\.0\.1:\d+\/\?token=\S+)/.exec(out);
      if (m) {
        clearTimeout(timer);
        done({ url: m[1], proc, stop });
      }
    });
    proc.once('exit', (code) => {
      clearTimeout(timer);
      fail(new Error(`the shell exited (${code}) before printing its address\n${out}\n${err}`));
    });
  });
}

/** A browser shell with Chromium on it, the given site files in its workspace and clipboard access granted. */
export interface WorkspaceSession {
  folders: ReturnType<typeof tempFolders>;
  shell: ShellProcess;
  browser: Browser;
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

export async function openWorkspaceSession(files: Record<string, string>): Promise<WorkspaceSession> {
  const folders = tempFolders();
  mkdirSync(folders.workspace, { recursive: true });
  for (const [name, text] of Object.entries(files)) writeFileSync(join(folders.workspace, name), text);
  const shell = await startShell(folders.workspace, folders.dataDir);
  const browser = await launchChromium();
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: new URL(shell.url).origin });
  const page = await context.newPage();
  await page.goto(shell.url);
  await page.getByRole('button', { name: 'New', exact: true }).waitFor();
  return {
    folders,
    shell,
    browser,
    context,
    page,
    async close() {
      await browser.close();
      await shell.stop();
      folders.remove();
    },
  };
}
