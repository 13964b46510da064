/** A malformed command line (exit 2, like bad input). */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

export interface CommandResult {
  stdout: string;
  /** a one-line reason shown on stderr (with a non-zero exit code) */
  stderr?: string;
  exitCode?: number;
}

/** `gprime assess`: the output was written in full, but an estimate is 'error' or 'incomplete'. */
export const EXIT_NOT_ALL_OK = 3;
