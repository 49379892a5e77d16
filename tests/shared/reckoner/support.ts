import { ReckonerError } from '@shared/reckoner';

/** The ReckonerError a call throws; fails the test when it throws nothing or something else. */
export function errorOf(call: () => unknown): ReckonerError {
  try {
    call();
  } catch (error) {
    if (error instanceof ReckonerError) return error;
    throw error;
  }
  throw new Error('expected a ReckonerError');
}
