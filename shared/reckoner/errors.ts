/**
 * The one error every reckoner function throws for bad input. `field` names the
 * query or form field at fault, so routes can answer `{ error: { fields } }` and
 * forms can put the message beside the right input without matching message text.
 */
export class ReckonerError extends Error {
  readonly field: string;
  readonly code = 'reckoner_invalid';

  constructor(field: string, message: string) {
    super(message);
    this.name = 'ReckonerError';
    this.field = field;
  }
}
