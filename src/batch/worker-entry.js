// Worker processes start without tsx's loader; register it, then load the TypeScript worker.
import { register } from 'tsx/esm/api';

register();
await import('./solve-worker.ts');
