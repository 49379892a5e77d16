import type { Migration } from './types';
import * as m0001 from './0001-users-and-sessions';
import * as m0002 from './0002-catalogue';
import * as m0003 from './0003-facsimile-per-source-unique';
import * as m0004 from './0004-programmes';

/**
 * The schema's history, in order. Each entry is reversible (`down` undoes `up`).
 * Add a file `NNNN-what-it-does.ts` exporting `up` and `down`, then list it here;
 * never edit a migration that has landed.
 */
export const migrations: { name: string; up: Migration; down: Migration }[] = [
  { name: '0001-users-and-sessions', ...m0001 },
  { name: '0002-catalogue', ...m0002 },
  { name: '0003-facsimile-per-source-unique', ...m0003 },
  { name: '0004-programmes', ...m0004 },
];
