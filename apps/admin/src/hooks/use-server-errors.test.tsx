import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useForm } from 'react-hook-form';
import { describe, expect, it } from 'vitest';
import { ApiError } from '../lib/api-client';
import { useServerErrors } from './use-server-errors';

const options = {
  codeFields: { email_taken: 'email' as const },
  messages: { email_taken: 'Another account already uses this e-mail address.' },
};

/** A profile form whose server answers with whatever failure the test hands it. */
function ProfileForm({ failure }: { failure: unknown }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ defaultValues: { firstName: 'Ada', email: 'ada@example.org' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['firstName', 'email'], options);

  const onSubmit = handleSubmit(async () => {
    setFormError(null);
    try {
      await Promise.reject(failure);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit}>
      {formError && <p role="alert">{formError}</p>}
      <label>
        First name
        <input {...register('firstName')} />
      </label>
      {errors.firstName && <p>{errors.firstName.message}</p>}
      <label>
        E-mail
        <input {...register('email')} />
      </label>
      {errors.email && <p>{errors.email.message}</p>}
      <button type="submit">Save profile</button>
    </form>
  );
}

describe('server errors on a form', () => {
  it('puts each field’s error under it and focuses the first field in the form’s order', async () => {
    const user = userEvent.setup();
    const failure = new ApiError({
      status: 400,
      code: 'validation_failed',
      title: 'Check the form',
      fieldErrors: { email: ['Enter an e-mail address.'], firstName: ['Enter a name.'] },
    });
    render(<ProfileForm failure={failure} />);

    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect(await screen.findByText('Enter a name.')).toBeTruthy();
    expect(screen.getByText('Enter an e-mail address.')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('First name'));
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('places a known conflict under its field, in the form’s own words', async () => {
    const user = userEvent.setup();
    render(<ProfileForm failure={new ApiError({ status: 409, code: 'email_taken', title: 'Conflict' })} />);

    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect(await screen.findByText('Another account already uses this e-mail address.')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('E-mail'));
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('says what belongs to no field in the alert above the form', async () => {
    const user = userEvent.setup();
    render(<ProfileForm failure={new ApiError({ status: 500, code: 'http_500', title: 'The server had a problem. Try again in a moment.' })} />);

    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect((await screen.findByRole('alert')).textContent).toBe('The server had a problem. Try again in a moment.');
  });

  it('says something even when the failure did not come from the server', async () => {
    const user = userEvent.setup();
    render(<ProfileForm failure={new Error('offline')} />);

    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect((await screen.findByRole('alert')).textContent).toBe('Something went wrong. Try again.');
  });
});
