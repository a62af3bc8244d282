import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';
import { fieldMessages, type FieldMessage } from './field-paths';

/**
 * Puts a 400's `fields` next to their inputs (react-hook-form `setError`) and the rest of any error
 * in `root.server`. Returns the field messages so a form can also list them at the top.
 */
export function applyApiError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  options: { stripPrefix?: string } = {},
): FieldMessage[] {
  if (!isApiError(error)) {
    setError('root.server', { type: 'server', message: 'Something went wrong. Please try again.' });
    return [];
  }
  const messages = fieldMessages(error.fields, options.stripPrefix);
  for (const { formPath, message } of messages) {
    if (formPath === '') setError('root.server', { type: 'server', message });
    else setError(formPath as Path<T>, { type: 'server', message });
  }
  if (messages.length === 0) setError('root.server', { type: 'server', message: error.message });
  return messages;
}
