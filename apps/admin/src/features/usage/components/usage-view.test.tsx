import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { beforeAll, describe, expect, it } from 'vitest';
import { UsageView, type MachineUsageReport, type MemberUsageReport } from './usage-view';

// jsdom lays nothing out; the charts only need the observer to exist.
beforeAll(() => {
  globalThis.ResizeObserver ??= class {
    observe() {}
    unobserve() {}
    disconnect() {}
  };
});

const range = { from: '2026-11-01', to: '2026-11-30' };

const shared = {
  from: range.from,
  to: range.to,
  timeZone: 'America/Chicago',
  heatmap: [
    { weekday: 2, hour: 9, hours: 1.5 },
    { weekday: 2, hour: 10, hours: 4 },
    { weekday: 6, hour: 14, hours: 0.5 },
  ],
  reservations: { made: 20, used: 15, noShows: 3, cancelled: 2 },
  denials: [
    { code: 'sign_off_missing', rule: 2, count: 7 },
    { code: 'shop_closed', rule: 7, count: 2 },
    { code: 'unknown_badge', rule: null, count: 1 },
  ],
  trainingsInDemand: [{ trainingId: '00000000-0000-4000-8000-0000000000c1', trainingName: 'Metal lathe fundamentals', count: 5 }],
  signOffs: [
    { instructorId: '00000000-0000-4000-8000-0000000000d1', instructorName: 'Ingrid Vasquez-Holm', count: 4 },
    { instructorId: '00000000-0000-4000-8000-0000000000d2', instructorName: 'Bram Okonkwo-Lee', count: 9 },
  ],
} satisfies Omit<MachineUsageReport, 'groupBy' | 'rows'>;

const machines: MachineUsageReport = {
  ...shared,
  groupBy: 'machine',
  rows: [
    { machineId: '00000000-0000-4000-8000-0000000000a1', machineName: 'Engine lathe', sessions: 6, hours: 12.5, openHours: 160, utilization: 0.078 },
    { machineId: '00000000-0000-4000-8000-0000000000a2', machineName: 'Knee mill', sessions: 9, hours: 30, openHours: 160, utilization: 0.1875 },
    { machineId: '00000000-0000-4000-8000-0000000000a3', machineName: 'Drill press', sessions: 0, hours: 0, openHours: 160, utilization: 0 },
  ],
};

const members: MemberUsageReport = {
  ...shared,
  groupBy: 'member',
  rows: [
    { memberId: '00000000-0000-4000-8000-0000000000b1', memberName: 'Odile Carver', sessions: 8, hours: 22 },
    { memberId: '00000000-0000-4000-8000-0000000000b2', memberName: 'Tomasz Fenwright', sessions: 7, hours: 20.5 },
  ],
};

function setup() {
  const user = userEvent.setup();
  render(
    <MemoryRouter>
      <UsageView range={range} machines={machines} members={members} />
    </MemoryRouter>,
  );
  return { user };
}

function columnTexts(table: HTMLElement, column: number): string[] {
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[column]?.textContent ?? '');
}

describe('UsageView', () => {
  it('lists the machines busiest first with their hours and utilization, and says the main figure in words', () => {
    setup();
    const table = screen.getByRole('table', { name: 'Hours per machine' });
    expect(columnTexts(table, 0)).toEqual(['Knee mill', 'Engine lathe', 'Drill press']);
    expect(columnTexts(table, 2)).toEqual(['30.0 h', '12.5 h', '0.0 h']);
    // 30 h of 160 open hours is 18.75 %, shown to a tenth of a per cent; Intl rounds the half up (ECMA-402 "halfExpand").
    expect(columnTexts(table, 4)).toEqual(['18.8%', '7.8%', '0%']);
    expect(screen.getByText('Knee mill ran longest: 30.0 h, 18.8% of open hours. All machines: 42.5 h in 15 sessions.')).toBeTruthy();
  });

  it('sorts a table on the column a person presses, and turns it round on a second press', async () => {
    const { user } = setup();
    const table = screen.getByRole('table', { name: 'Hours per machine' });
    await user.click(within(table).getByRole('button', { name: 'Machine' }));
    expect(columnTexts(table, 0)).toEqual(['Drill press', 'Engine lathe', 'Knee mill']);
    expect(within(table).getByRole('columnheader', { name: 'Machine' }).getAttribute('aria-sort')).toBe('ascending');
    await user.click(within(table).getByRole('button', { name: 'Machine' }));
    expect(columnTexts(table, 0)).toEqual(['Knee mill', 'Engine lathe', 'Drill press']);
    expect(within(table).getByRole('columnheader', { name: 'Machine' }).getAttribute('aria-sort')).toBe('descending');

    const signOffs = screen.getByRole('table', { name: 'Sign-offs per instructor' });
    await user.click(within(signOffs).getByRole('button', { name: 'Sign-offs given' }));
    expect(columnTexts(signOffs, 0)).toEqual(['Bram Okonkwo-Lee', 'Ingrid Vasquez-Holm']);
  });

  it('writes every heatmap cell as text, so the shade is never the only sign', () => {
    setup();
    const grid = screen.getByRole('table', { name: /Hours of use by weekday and hour/ });
    const tuesday = within(grid).getByRole('rowheader', { name: 'Tuesday' }).closest('tr');
    if (!tuesday) throw new Error('no Tuesday row');
    // Hours 09:00–14:00 are the span with any use; Tuesday 10:00 is its second column. An empty
    // cell shows a dot and reads out "none".
    expect(within(grid).getAllByRole('columnheader').map((cell) => cell.textContent)).toEqual(['09:00', '10:00', '11:00', '12:00', '13:00', '14:00']);
    expect(within(tuesday).getAllByRole('cell').map((cell) => cell.textContent)).toEqual(['1.5', '4', '·none', '·none', '·none', '·none']);
    expect(screen.getByRole('list', { name: 'Shade (hours of use in the cell)' }).textContent).toContain('over 3.0 h to 4.0 h');
  });

  it('shows the reservation figures, the busiest members and the refused scans by reason', () => {
    setup();
    expect(screen.getByText('Of 20 reservations made, 15 were used (75%) and 3 were no-shows (15%).')).toBeTruthy();
    expect(columnTexts(screen.getByRole('table', { name: 'Busiest members' }), 0)).toEqual(['Odile Carver', 'Tomasz Fenwright']);
    const denials = screen.getByRole('table', { name: 'Refused scans by reason' });
    expect(columnTexts(denials, 0)).toEqual(['Not signed off', 'Shop closed', 'Badge not known']);
    expect(columnTexts(denials, 1)).toEqual(['Rule 2', 'Rule 7', 'Before the rules']);
    expect(columnTexts(screen.getByRole('table', { name: 'Trainings in demand' }), 0)).toEqual(['Metal lathe fundamentals']);
  });

  it("links each table's CSV export to the report's same range and table", () => {
    setup();
    const href = (name: string) => screen.getByRole('link', { name: `Export CSV of ${name}` }).getAttribute('href');
    expect(href('hours per machine')).toBe('/api/reports/usage?from=2026-11-01&to=2026-11-30&groupBy=machine&format=csv&table=rows');
    expect(href('the busiest members')).toBe('/api/reports/usage?from=2026-11-01&to=2026-11-30&groupBy=member&format=csv&table=rows');
    expect(href("the week's hours")).toContain('table=heatmap');
    expect(href('the reservations')).toContain('table=reservations');
    expect(href('refused scans by reason')).toContain('table=denials');
    expect(href('trainings in demand')).toContain('table=trainings');
    expect(href('sign-offs per instructor')).toContain('table=signOffs');
  });
});
