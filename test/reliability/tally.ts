// The reliability figure: per area, inputs tried / accepted / refused cleanly / crashes / hangs / data
// changed. A crash is an uncaught exception, an internal error or a wrong answer (a path outside the
// workspace accepted, a 500); a hang is an input left unanswered past its deadline; "data changed" counts
// inputs after which a file that had to stay as it was did not.
export type Outcome = 'accepted' | 'refused' | 'crash' | 'hang';

export interface AreaCounts {
  area: string;
  tried: number;
  accepted: number;
  refused: number;
  crashes: number;
  hangs: number;
  dataChanged: number;
  /** the first few failures, to reproduce them */
  examples: string[];
}

export class Tally {
  readonly areas: AreaCounts[] = [];

  area(name: string): AreaRecorder {
    const counts: AreaCounts = {
      area: name,
      tried: 0,
      accepted: 0,
      refused: 0,
      crashes: 0,
      hangs: 0,
      dataChanged: 0,
      examples: [],
    };
    this.areas.push(counts);
    return new AreaRecorder(counts);
  }

  get total(): number {
    return this.areas.reduce((n, a) => n + a.tried, 0);
  }

  /** A Markdown table of the counts, with a total row. */
  table(): string {
    const cols = ['tried', 'accepted', 'refused', 'crashes', 'hangs', 'dataChanged'] as const;
    const sum = (k: (typeof cols)[number]) => this.areas.reduce((n, a) => n + a[k], 0);
    const row = (cells: (string | number)[]) => `| ${cells.join(' | ')} |`;
    return [
      row(['area', 'tried', 'accepted', 'refused cleanly', 'crashes', 'hangs', 'data changed']),
      row(['---', ...cols.map(() => '---:')]),
      ...this.areas.map((a) => row([a.area, ...cols.map((k) => a[k])])),
      row(['**total**', ...cols.map(sum)]),
    ].join('\n');
  }
}

export class AreaRecorder {
  constructor(readonly counts: AreaCounts) {}

  record(outcome: Outcome, input: unknown, detail = ''): void {
    const c = this.counts;
    c.tried++;
    if (outcome === 'accepted') c.accepted++;
    else if (outcome === 'refused') c.refused++;
    else {
      if (outcome === 'crash') c.crashes++;
      else c.hangs++;
      this.example(`${outcome}: ${detail} — input ${JSON.stringify(input)?.slice(0, 300)}`);
    }
  }

  dataChanged(input: unknown, what: string): void {
    this.counts.dataChanged++;
    this.example(`data changed: ${what} — input ${JSON.stringify(input)?.slice(0, 300)}`);
  }

  private example(text: string): void {
    if (this.counts.examples.length < 5) this.counts.examples.push(text);
  }
}

/** Resolves with the promise's value, or with 'hang' when it has not settled within `ms`. */
export function withDeadline<T>(p: Promise<T>, ms: number): Promise<T | 'hang'> {
  let timer: NodeJS.Timeout | undefined;
  const deadline = new Promise<'hang'>((done) => (timer = setTimeout(() => done('hang'), ms)));
  return Promise.race([p, deadline]).finally(() => clearTimeout(timer));
}
