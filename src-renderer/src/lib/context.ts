import { getContext, setContext } from 'svelte';
import type { Workspace } from '../state/workspace.svelte';
import type { FileActions } from '../state/files.svelte';

const KEY = Symbol('gprime-workspace');

export interface AppContext {
  ws: Workspace;
  files: FileActions;
}

export function provideApp(ctx: AppContext): void {
  setContext(KEY, ctx);
}

export function useApp(): AppContext {
  return getContext<AppContext>(KEY);
}
