/** The error a command throws for a mistake the user made on the command line or in a file: exit 1, no stack trace. */

export class UserError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UserError';
  }
}
