/**
 * Errors of the preset store and settings. A StoreError carries a one-line
 * message for the user; it extends UsageError so the CLI maps it to exit 2
 * and prints the message without a stack trace.
 */
import {UsageError} from '../app/errors.js';

export class StoreError extends UsageError {
  constructor(message: string, option?: string) {
    super(message, option);
    this.name = 'StoreError';
  }
}
