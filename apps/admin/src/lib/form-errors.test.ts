import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { splitServerErrors } from './form-errors';

const fields = ['firstName', 'email'] as const;

describe('splitServerErrors', () => {
  it('puts each field error under its own field and nothing above the form', () => {
    const error = new ApiError({
      status: 400,
      code: 'validation_failed',
      title: 'Check the form',
      fieldErrors: { email: ['Enter an e-mail address.'], firstName: ['Enter a name.', 'Use letters.'] },
    });

    expect(splitServerErrors(error, fields)).toEqual({
      fields: { email: 'Enter an e-mail address.', firstName: 'Enter a name. Use letters.' },
      message: null,
    });
  });

  it('shows errors about fields the form does not have above the form', () => {
    const error = new ApiError({
      status: 400,
      code: 'validation_failed',
      title: 'Check the form',
      fieldErrors: { token: ['The link is not valid.'] },
    });

    expect(splitServerErrors(error, fields)).toEqual({ fields: {}, message: 'The link is not valid.' });
  });

  it('places a known conflict under the field it concerns, in the form’s own words', () => {
    const error = new ApiError({ status: 409, code: 'email_taken', title: 'Conflict' });

    expect(
      splitServerErrors(error, fields, {
        codeFields: { email_taken: 'email' },
        messages: { email_taken: 'Another account already uses this e-mail address.' },
      }),
    ).toEqual({ fields: { email: 'Another account already uses this e-mail address.' }, message: null });
  });

  it('shows any other failure as one message above the form', () => {
    const error = new ApiError({ status: 500, code: 'http_500', title: 'The server had a problem.' });

    expect(splitServerErrors(error, fields)).toEqual({ fields: {}, message: 'The server had a problem.' });
  });

  it('still says something when the failure is not from the API', () => {
    expect(splitServerErrors(new Error('boom'), fields).message).toBe('Something went wrong. Try again.');
  });
});
