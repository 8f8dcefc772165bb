/**
 * Bad input or usage, shared by the CLI, the store and the resolver: the
 * message names the option and the accepted range. The CLI maps it to exit 2.
 */
export class UsageError extends Error {
  constructor(
    message: string,
    /** The option or argument at fault, e.g. "--engage". */
    readonly option?: string,
  ) {
    super(message);
    this.name = 'UsageError';
  }
}
