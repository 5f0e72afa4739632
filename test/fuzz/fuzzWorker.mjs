// fuzzWorker: the worker-thread entry of the fuzz runner; loads TypeScript through tsx, then the worker body.
import { register } from 'tsx/esm/api';

register();
await import('./fuzzWorkerBody.ts');
