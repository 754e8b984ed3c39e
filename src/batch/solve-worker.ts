/** Worker thread: solves the task files it is sent, one at a time. */
import { parentPort } from 'node:worker_threads';
import type { SolveOptions } from '../search/solve.ts';
import { errorReport, solveFile } from './solve-file.ts';
import { applyWorkerSettings, libraryWithPriors, type PriorBits } from './solve-worker-settings.ts';

applyWorkerSettings();

export interface WorkerRequest {
  readonly id: number;
  readonly file: string;
  readonly options: Omit<SolveOptions, 'library'>;
  readonly priors?: PriorBits;
}

parentPort!.on('message', (request: WorkerRequest) => {
  let report;
  try {
    report = solveFile(request.file, { ...request.options, library: libraryWithPriors(request.priors) });
  } catch (error) {
    report = errorReport(request.file, `${request.file}: the solver stopped with an internal error: ${(error as Error).message}`, 'internal error');
  }
  parentPort!.postMessage({ id: request.id, report });
});
