/**
 * Thrown by every engine computation when its input cannot be evaluated.
 * The message names the offending field so the HTTP layer can pass it on as a 400 unchanged.
 */
export class EngineInputError extends Error {
  constructor(
    message: string,
    /** Name of the input field at fault, when one field is to blame. */
    readonly field?: string,
  ) {
    super(message);
    this.name = 'EngineInputError';
  }
}
