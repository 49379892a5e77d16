/**
 * `npm run serve`: serves Windway from the environment alone (DATABASE_URL, MEILI_HOST, …),
 * with none of `npm start`'s local set-up — the entry point for a deployment, and the
 * separate app process of `npm run load`. Migrates first unless MIGRATE=0.
 * SIGTERM or SIGINT: finishes the requests in flight, stops background work, exits.
 * Started with an IPC channel (child_process.fork), it sends `{ url }` once listening.
 */
import { startWindway } from '../index';

const app = await startWindway({ migrate: process.env.MIGRATE !== '0' });
console.log(`[serve] Windway is listening on ${app.url}`);
process.send?.({ url: app.url });

let closing = false;
const shutDown = async () => {
  if (closing) return;
  closing = true;
  await app.close();
  process.exit(0);
};
process.on('SIGTERM', shutDown);
process.on('SIGINT', shutDown);
