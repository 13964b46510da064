/** A malformed command line (exit 2, like bad input). */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

export interface CommandResult {
  stdout: string;
  exitCode?: number;
}
