import { randomInt } from 'node:crypto';

// Crockford-style alphabet: no I, L, O, U, so ids survive being read aloud or copied by hand.
const alphabet = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';

/** A short, stable, unguessable public id such as `S-7K2QX9`, used in URLs and citations. */
export function newPublicId(prefix: 'S' | 'E' | 'P'): string {
  let id = '';
  for (let i = 0; i < 7; i += 1) id += alphabet[randomInt(alphabet.length)];
  return `${prefix}${id}`;
}

export const publicIdPattern = /^[SEP][0-9A-HJKMNP-TV-Z]{7}$/;
