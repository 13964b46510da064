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

type ErrorClass = abstract new (...args: never[]) => Error;

/** Error classes that mean bad input (exit 2). A command loaded on demand adds its own when it loads. */
const BAD_INPUT: ErrorClass[] = [UsageError];

export function treatAsBadInput(...classes: ErrorClass[]): void {
  BAD_INPUT.push(...classes);
}

export const isBadInput = (e: unknown): boolean => BAD_INPUT.some((c) => e instanceof c);
