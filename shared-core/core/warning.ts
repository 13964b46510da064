/**
 * A structured warning: views decide how to show it from its code and severity, never from its text.
 * - `note`: information that qualifies a result (a regime, an assumption made);
 * - `caution`: the result holds but needs care (near a limit, a sensitive coefficient, a conservative choice);
 * - `outside-validity`: an input or the result lies outside the range the method was calibrated or validated
 *   for; the result is an extrapolation.
 */
export type Severity = 'note' | 'caution' | 'outside-validity';

export interface Warning {
  /** stable kebab-case identifier of the kind of warning (e.g. "validity-range", "plume-surfaces") */
  code: string;
  severity: Severity;
  /** the parameter the warning is about, as the calc method names it */
  input?: string;
  message: string;
}

export function note(code: string, message: string, input?: string): Warning {
  return input === undefined ? { code, severity: 'note', message } : { code, severity: 'note', input, message };
}

export function caution(code: string, message: string, input?: string): Warning {
  return input === undefined ? { code, severity: 'caution', message } : { code, severity: 'caution', input, message };
}

export function outsideValidity(code: string, message: string, input?: string): Warning {
  return input === undefined
    ? { code, severity: 'outside-validity', message }
    : { code, severity: 'outside-validity', input, message };
}

/** One warning per code, input and message (the same warning raised twice is shown once). */
export function uniqueWarnings(list: readonly Warning[]): Warning[] {
  const seen = new Set<string>();
  return list.filter((w) => {
    const key = `${w.code}|${w.input ?? ''}|${w.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
