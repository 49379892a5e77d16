import { ReckonerError } from '@shared/reckoner';

/** A computation's answer, or the field at fault and the shared code's own message. */
export type Outcome<T> = { ok: true; value: T } | { ok: false; field: string; message: string };

export function attempt<T>(compute: () => T, fallbackField = 'value'): Outcome<T> {
  try {
    return { ok: true, value: compute() };
  } catch (error) {
    if (error instanceof ReckonerError) return { ok: false, field: error.field, message: error.message };
    return { ok: false, field: fallbackField, message: error instanceof Error ? error.message : String(error) };
  }
}

/** The message for one field, if the outcome failed there. */
export function errorFor(outcome: Outcome<unknown> | undefined, ...fields: string[]): string | undefined {
  return outcome && !outcome.ok && fields.includes(outcome.field) ? outcome.message : undefined;
}
