/**
 * `npm run reindex`: rebuilds the `excerpts` index from MariaDB while the app keeps
 * serving. Needs DATABASE_URL and MEILI_HOST (and MEILI_KEY) as the app has them.
 */
import { reindexAll } from '../indexer';
import { closeSequelize } from '@server/db';

if (!process.env.DATABASE_URL || !process.env.MEILI_HOST) {
  console.error('Set DATABASE_URL and MEILI_HOST (and MEILI_KEY) to the values the running app uses, then run `npm run reindex` again.');
  process.exit(2);
}

const interactive = process.stdout.isTTY;
let lastLine = 0;
try {
  const result = await reindexAll({
    onProgress: (p) => {
      const now = Date.now();
      if (!interactive && now - lastLine < 2000 && p.done < p.total) return;
      lastLine = now;
      const line = `re-index: ${p.done}/${p.total} excerpts, ${Math.round(p.docsPerSecond)} docs/s`;
      if (interactive) process.stdout.write(`\r${line}   `);
      else console.log(line);
    },
  });
  if (interactive) process.stdout.write('\n');
  console.log(
    `re-index: ${result.done} documents in ${(result.elapsedMs / 1000).toFixed(1)} s (${Math.round(result.docsPerSecond)} docs/s); ${result.deleted} stale documents removed.`,
  );
} catch (error) {
  console.error(`re-index failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exitCode = 1;
} finally {
  await closeSequelize();
}
