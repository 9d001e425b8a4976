/** Shared by the document tests: the DocumentError a call throws. */

import { expect } from 'vitest';
import { DocumentError } from '../../src/document/errors.ts';

/** The DocumentError `fn` throws (fails the test if it throws anything else or nothing). */
export function documentErrorOf(fn: () => unknown): DocumentError {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(DocumentError);
    return error as DocumentError;
  }
  throw new Error('expected a DocumentError, nothing was thrown');
}
