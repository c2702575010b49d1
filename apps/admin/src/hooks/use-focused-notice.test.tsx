import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { useFocusedNotice } from './use-focused-notice';

function SaveForm() {
  const [saved, setSaved, savedRef] = useFocusedNotice<string | null>(null);
  return (
    <>
      {saved && (
        <div ref={savedRef} tabIndex={-1}>
          {saved}
        </div>
      )}
      <button type="button" onClick={() => setSaved('Hours saved.')}>
        Save
      </button>
      <button type="button" onClick={() => setSaved(null)}>
        Edit again
      </button>
    </>
  );
}

describe('useFocusedNotice', () => {
  // Common practice (WAI-ARIA Authoring Practices, managing focus): the result of an action is read where focus lands.
  it('moves focus to the notice when it appears, and leaves focus alone when it goes', async () => {
    const user = userEvent.setup();
    render(<SaveForm />);

    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(document.activeElement?.textContent).toBe('Hours saved.');

    const editAgain = screen.getByRole('button', { name: 'Edit again' });
    await user.click(editAgain);
    expect(screen.queryByText('Hours saved.')).toBeNull();
    expect(document.activeElement).toBe(editAgain);
  });
});
