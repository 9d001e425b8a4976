/** Typed error for an edit that cannot be made, with a message a porter can act on. */

export class EditError extends Error {
  /** Name of the edit that refused, e.g. "deleteVertex"; "" when the edit itself is unknown. */
  readonly edit: string;

  constructor(edit: string, message: string) {
    super(message);
    this.name = 'EditError';
    this.edit = edit;
  }
}
