/**
 * Work that runs beside the HTTP server in the same process (the search outbox
 * worker, the facsimile text extractor). Each job is a starter returning its own
 * stop function; add a feature's job to this list.
 */
import { startOutboxWorker } from '@search/outbox-worker';
import { startFacsimileWork } from './services/facsimile-jobs';

type Job = () => () => Promise<void>;

const jobs: Job[] = [() => startOutboxWorker(), () => startFacsimileWork()];

export function startBackgroundWork(): () => Promise<void> {
  const stops = jobs.map((job) => job());
  return async () => {
    await Promise.all(stops.map((stop) => stop()));
  };
}
