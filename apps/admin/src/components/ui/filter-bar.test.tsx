import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ChoiceFilter, FilterBar } from './filter-bar';

type Shade = 'teal' | 'brass';
const shades: readonly Shade[] = ['teal', 'brass'];
const isShade = (value: string): value is Shade => (shades as readonly string[]).includes(value);

function Filters({ value, onChange, exportHref }: { value: Shade | undefined; onChange: (value: Shade | undefined) => void; exportHref?: string }) {
  return (
    <FilterBar label="Filter the plates" exportHref={exportHref}>
      <ChoiceFilter
        label="Shade"
        every="Every shade"
        value={value}
        choices={shades.map((shade) => ({ value: shade, label: shade === 'teal' ? 'Teal' : 'Brass' }))}
        isChoice={isShade}
        onChange={onChange}
      />
    </FilterBar>
  );
}

describe('FilterBar and ChoiceFilter', () => {
  it('name the filters as a search landmark and offer the export of the same list', () => {
    render(<Filters value={undefined} onChange={() => {}} exportHref="/api/plates/export.csv?shade=teal" />);

    const region = screen.getByRole('search', { name: 'Filter the plates' });
    expect(region.contains(screen.getByRole('combobox', { name: 'Shade' }))).toBe(true);
    expect(screen.getByRole('link', { name: 'Export CSV' }).getAttribute('href')).toBe('/api/plates/export.csv?shade=teal');
  });

  it('leave the export out when there is nothing to export yet', () => {
    render(<Filters value={undefined} onChange={() => {}} />);
    expect(screen.queryByRole('link', { name: 'Export CSV' })).toBeNull();
  });

  it('hand back the chosen value, and undefined for "Every …"', async () => {
    const onChange = vi.fn();
    const { rerender } = render(<Filters value={undefined} onChange={onChange} />);
    const shade = screen.getByRole<HTMLSelectElement>('combobox', { name: 'Shade' });
    expect(shade.value).toBe('');

    await userEvent.selectOptions(shade, 'Brass');
    expect(onChange).toHaveBeenLastCalledWith('brass');

    rerender(<Filters value="brass" onChange={onChange} />);
    expect(shade.value).toBe('brass');
    await userEvent.selectOptions(shade, 'Every shade');
    expect(onChange).toHaveBeenLastCalledWith(undefined);
  });
});
