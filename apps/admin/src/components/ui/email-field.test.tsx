import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { EmailField } from './email-field';

describe('an e-mail field', () => {
  it('asks phones for the e-mail keyboard and leaves the address as typed', () => {
    render(<EmailField autoComplete="username" />);

    const input = screen.getByLabelText('E-mail');
    expect(input.getAttribute('type')).toBe('email');
    expect(input.getAttribute('inputmode')).toBe('email');
    expect(input.getAttribute('autocapitalize')).toBe('none');
    expect(input.getAttribute('spellcheck')).toBe('false');
    expect(input.getAttribute('autocomplete')).toBe('username');
  });

  it('reads its hint and its error with it', () => {
    render(<EmailField autoComplete="email" hint="You sign in with it." error="Enter an e-mail address." />);

    const input = screen.getByLabelText('E-mail');
    const described = (input.getAttribute('aria-describedby') ?? '').split(' ').map((id) => document.getElementById(id)?.textContent);
    expect(described).toEqual(['You sign in with it.', 'Enter an e-mail address.']);
    expect(input.getAttribute('aria-invalid')).toBe('true');
  });
});
