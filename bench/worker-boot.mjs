// Starts a TypeScript worker of the benchmark: tsx's loader does not reach worker threads by itself.
import { register } from 'tsx/esm/api';
import { workerData } from 'node:worker_threads';

register();
await import(new URL(workerData.module, import.meta.url).href);
