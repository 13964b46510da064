import { SiteFileError } from '../../shared-core/site/load';
import type { ContractError } from '../../shared-core/ipc/contract';

/** An error with a contract code ('forbidden', 'not-found', 'unsupported', …) that a handler answers as a Reply. */
export class ServiceError extends Error {
  readonly code: string;
  constructor(code: string, message: string) {
    super(message);
    this.name = 'ServiceError';
    this.code = code;
  }
}

const IO_CODES: Record<string, string> = {
  ENOENT: 'no such file or folder',
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  ENOSPC: 'the disk is full',
  EISDIR: 'this is a folder, not a file',
  EROFS: 'the disk is read-only',
};

/** Node refuses a path with a NUL character before touching the disk; such a path is a bad request. */
const isNulInPath = (e: unknown) =>
  (e as NodeJS.ErrnoException | undefined)?.code === 'ERR_INVALID_ARG_VALUE' && /null bytes/.test(String(e));

/** Maps anything thrown by a service to the contract's error shape. */
export function toContractError(e: unknown): ContractError {
  if (e instanceof ServiceError) return { code: e.code, message: e.message };
  if (isNulInPath(e)) return { code: 'invalid-request', message: 'a path contains a NUL character' };
  if (e instanceof SiteFileError) return { code: 'site-file', message: e.message };
  const errno = (e as NodeJS.ErrnoException | undefined)?.code;
  if (typeof errno === 'string' && /^E[A-Z]+$/.test(errno)) {
    const path = (e as NodeJS.ErrnoException).path;
    const what = IO_CODES[errno] ?? errno;
    return { code: errno === 'ENOENT' ? 'not-found' : 'io', message: path ? `${path}: ${what}` : what };
  }
  return { code: 'internal', message: e instanceof Error ? e.message : String(e) };
}
