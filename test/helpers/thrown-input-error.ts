import { InputError } from '../../src/units/input-error.js';

/** The InputError an action throws; any other error is rethrown, and no error at all fails the test. */
export function thrownInputError(action: () => void): InputError {
  try {
    action();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('the action was not refused');
}
