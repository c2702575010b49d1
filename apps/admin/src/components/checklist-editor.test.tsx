import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ChecklistEditor, checklistErrorProps, type ChecklistFieldErrors } from './checklist-editor';

const items = [
  { key: 'a', id: 'goggles', label: 'Goggles on' },
  { key: 'b', id: '', label: '' },
];

function renderWith(errors: ChecklistFieldErrors) {
  render(<ChecklistEditor legend="Safety checklist" hint="What a member confirms." items={items} onChange={() => {}} {...checklistErrorProps(errors)} />);
}

describe('a checklist field’s errors', () => {
  it('puts an error about one item under that item', () => {
    renderWith([undefined, { label: { type: 'too_small', message: 'Write what to check.' } }] as ChecklistFieldErrors);

    const second = screen.getByLabelText('Item 2');
    expect(second.getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(second.getAttribute('aria-describedby') ?? '')?.textContent).toBe('Write what to check.');
    expect(screen.getByLabelText('Item 1').getAttribute('aria-invalid')).toBeNull();
  });

  it('puts an error about the whole list under the list', () => {
    renderWith({ type: 'too_small', message: 'List at least one practical item.' });

    const list = screen.getByRole('group', { name: 'Safety checklist' });
    expect(list.textContent).toContain('List at least one practical item.');
    expect(screen.getByLabelText('Item 1').getAttribute('aria-invalid')).toBeNull();
  });

  it('reads the list’s error where react-hook-form keeps it beside item errors', () => {
    expect(checklistErrorProps({ root: { type: 'too_big', message: 'Use at most 40 items.' } } as ChecklistFieldErrors)).toEqual({
      error: 'Use at most 40 items.',
      itemErrors: [],
    });
  });

  it('shows nothing when the checklist is fine', () => {
    expect(checklistErrorProps(undefined)).toEqual({ error: undefined, itemErrors: [] });
  });
});
