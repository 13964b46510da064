// Builds the CLI bundle once before the test workers start, so CLI tests never race to rebuild it.
// @ts-expect-error plain JS module without types
import { ensureCliBundle } from '../bin/cli-bundle.js';

export default async function setup(): Promise<void> {
  await ensureCliBundle();
}
