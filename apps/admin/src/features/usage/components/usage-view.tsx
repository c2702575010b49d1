import {
  clearanceRuleTitles,
  type UsageCsvTable,
  type UsageDenial,
  type UsageGrouping,
  type UsageMachineRow,
  type UsageMemberRow,
  type UsageReport,
  type UsageSignOffs,
  type UsageTrainingDemand,
} from '@chuckkey/core';
import type { ColumnDef } from '@tanstack/react-table';
import { useId, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { DownloadIcon } from '../../../components/ui/icons';
import { Panel } from '../../../components/ui/panel';
import { paths } from '../../../config/paths';
import { nameCollator } from '../../../lib/table-sort';
import type { DateRange } from '../utils/date-range';
import { countLabel, denialLabels, hoursLabel, rangeLabel, usageCsvHref, utilizationLabel } from '../utils/usage-format';
import { BarChartFigure } from './bar-chart-figure';
import { ReportTable } from './report-table';
import { UsageHeatmap } from './usage-heatmap';

export type MachineUsageReport = Extract<UsageReport, { groupBy: 'machine' }>;
export type MemberUsageReport = Extract<UsageReport, { groupBy: 'member' }>;

function ExportCsv({ range, table, groupBy, what }: { range: DateRange; table: UsageCsvTable; groupBy?: UsageGrouping; what: string }) {
  return (
    <a href={usageCsvHref(range, table, groupBy)} download className={buttonClasses('secondary', 'self-start')}>
      <DownloadIcon />
      Export CSV <span className="sr-only">of {what}</span>
    </a>
  );
}

/** A chart and its figures side by side on a wide screen, one above the other on a phone. */
function SideBySide({ first, second }: { first: ReactNode; second: ReactNode }) {
  return (
    <div className="grid min-w-0 gap-4 lg:grid-cols-2 lg:items-start">
      <div className="min-w-0">{first}</div>
      <div className="min-w-0">{second}</div>
    </div>
  );
}

const byName = (a: string, b: string) => nameCollator.compare(a, b);

const machineColumns: ColumnDef<UsageMachineRow>[] = [
  { id: 'machine', header: 'Machine', accessorKey: 'machineName', sortingFn: (a, b) => byName(a.original.machineName, b.original.machineName) },
  { header: 'Sessions', accessorKey: 'sessions', cell: (cell) => countLabel(cell.getValue<number>()), meta: { numeric: true } },
  { header: 'Hours', accessorKey: 'hours', cell: (cell) => hoursLabel(cell.getValue<number>()), meta: { numeric: true } },
  { header: 'Open hours', accessorKey: 'openHours', cell: (cell) => hoursLabel(cell.getValue<number>()), meta: { numeric: true } },
  {
    header: 'Utilization',
    accessorFn: (row) => row.utilization ?? -1,
    id: 'utilization',
    cell: (cell) => utilizationLabel(cell.row.original.utilization),
    meta: { numeric: true },
  },
];

const memberColumns: ColumnDef<UsageMemberRow>[] = [
  {
    id: 'member',
    header: 'Member',
    accessorKey: 'memberName',
    sortingFn: (a, b) => byName(a.original.memberName, b.original.memberName),
    cell: (cell) => (
      <Link
        to={paths.memberRecord.getHref(cell.row.original.memberId)}
        state={{ name: cell.row.original.memberName }}
        className="text-brand underline underline-offset-4"
      >
        {cell.row.original.memberName}
      </Link>
    ),
  },
  { header: 'Sessions', accessorKey: 'sessions', cell: (cell) => countLabel(cell.getValue<number>()), meta: { numeric: true } },
  { header: 'Hours', accessorKey: 'hours', cell: (cell) => hoursLabel(cell.getValue<number>()), meta: { numeric: true } },
];

const denialColumns: ColumnDef<UsageDenial>[] = [
  {
    id: 'reason',
    header: 'Reason',
    accessorFn: (row) => denialLabels[row.code],
    sortingFn: (a, b) => byName(denialLabels[a.original.code], denialLabels[b.original.code]),
  },
  {
    id: 'rule',
    header: 'Rule',
    accessorFn: (row) => row.rule ?? 0,
    cell: (cell) => (cell.row.original.rule === null ? 'Before the rules' : <abbr title={clearanceRuleTitles[cell.row.original.rule]} className="no-underline">{`Rule ${cell.row.original.rule}`}</abbr>),
  },
  { header: 'Refused scans', accessorKey: 'count', cell: (cell) => countLabel(cell.getValue<number>()), meta: { numeric: true } },
];

const trainingColumns: ColumnDef<UsageTrainingDemand>[] = [
  { id: 'training', header: 'Training', accessorKey: 'trainingName', sortingFn: (a, b) => byName(a.original.trainingName, b.original.trainingName) },
  { header: 'Refused scans', accessorKey: 'count', cell: (cell) => countLabel(cell.getValue<number>()), meta: { numeric: true } },
];

const signOffColumns: ColumnDef<UsageSignOffs>[] = [
  { id: 'instructor', header: 'Instructor', accessorKey: 'instructorName', sortingFn: (a, b) => byName(a.original.instructorName, b.original.instructorName) },
  { header: 'Sign-offs given', accessorKey: 'count', cell: (cell) => countLabel(cell.getValue<number>()), meta: { numeric: true } },
];

function share(part: number, whole: number): string {
  return whole > 0 ? ` (${utilizationLabel(part / whole)})` : '';
}

function sum(values: readonly number[]): number {
  return values.reduce((total, value) => total + value, 0);
}

interface UsageViewProps {
  range: DateRange;
  machines: MachineUsageReport;
  members: MemberUsageReport;
}

/** The usage review for one range: each section a chart where a picture helps, and a sortable table with its CSV. */
export function UsageView({ range, machines, members }: UsageViewProps) {
  const trainingsHeadingId = useId();
  const { reservations, denials, trainingsInDemand, signOffs, heatmap, timeZone } = machines;
  const days = rangeLabel(range);
  const machineRows = machines.rows;
  const busiestMachine = [...machineRows].sort((a, b) => b.hours - a.hours)[0];
  const totalHours = sum(machineRows.map((row) => row.hours));
  const totalSessions = sum(machineRows.map((row) => row.sessions));
  const totalDenials = sum(denials.map((row) => row.count));
  const topDenial = denials[0];
  const topTraining = trainingsInDemand[0];

  return (
    <div className="flex flex-col gap-6">
      <Panel title="Hours per machine" description={`Use of each machine from ${days}, and its share of the shop's open hours.`}>
        {machineRows.length === 0 ? (
          <EmptyState title="No machines yet">Add the shop's machines in Setup; their hours show here once members use them.</EmptyState>
        ) : (
          <div className="flex flex-col gap-4">
            <BarChartFigure
              bars={machineRows.map((row) => ({ key: row.machineId, label: row.machineName, value: row.hours }))}
              formatValue={hoursLabel}
              valueName="Hours"
              caption={
                busiestMachine && busiestMachine.hours > 0
                  ? `${busiestMachine.machineName} ran longest: ${hoursLabel(busiestMachine.hours)}, ${utilizationLabel(busiestMachine.utilization)} of open hours. All machines: ${hoursLabel(totalHours)} in ${countLabel(totalSessions)} sessions.`
                  : 'No machine was used in these days.'
              }
            />
            <ReportTable caption="Hours per machine" data={machineRows} columns={machineColumns} getRowId={(row) => row.machineId} initialSorting={[{ id: 'hours', desc: true }]} />
            <ExportCsv range={range} table="rows" groupBy="machine" what="hours per machine" />
          </div>
        )}
      </Panel>

      <Panel title="When the shop is busy" description="Hours of machine use in each hour of the week, on the shop's clock; a session counts in every hour it covers.">
        <div className="flex flex-col gap-4">
          <UsageHeatmap cells={heatmap} timeZone={timeZone} />
          <ExportCsv range={range} table="heatmap" what="the week's hours" />
        </div>
      </Panel>

      <Panel title="Busiest members" description="Members by their hours on the machines, most first.">
        {members.rows.length === 0 ? (
          <EmptyState title="No one used a machine in these days">Choose more days, or check that the stations are paired in Setup.</EmptyState>
        ) : (
          <div className="flex flex-col gap-4">
            <ReportTable caption="Busiest members" data={members.rows} columns={memberColumns} getRowId={(row) => row.memberId} />
            <ExportCsv range={range} table="rows" groupBy="member" what="the busiest members" />
          </div>
        )}
      </Panel>

      <Panel title="Reservations" description="Reservations for these days: how many were made, checked into at the station, missed or cancelled.">
        <div className="flex flex-col gap-4">
          <SideBySide
            first={
              <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-2">
                {(
                  [
                    ['Made', reservations.made],
                    ['Used', reservations.used],
                    ['No-shows', reservations.noShows],
                    ['Cancelled', reservations.cancelled],
                  ] as const
                ).map(([label, value]) => (
                  <div key={label} className="flex flex-col rounded-lg border border-neutral-300 px-4 py-3">
                    <dt className="text-sm font-bold text-neutral-700">{label}</dt>
                    <dd className="text-2xl font-bold text-neutral-900 tabular-nums">{countLabel(value)}</dd>
                  </div>
                ))}
              </dl>
            }
            second={
              reservations.made === 0 ? (
                <p className="text-neutral-700">No reservations were made for these days.</p>
              ) : (
                <BarChartFigure
                  bars={[
                    { key: 'used', label: 'Used', value: reservations.used },
                    { key: 'noShows', label: 'No-shows', value: reservations.noShows },
                    { key: 'cancelled', label: 'Cancelled', value: reservations.cancelled },
                  ]}
                  formatValue={countLabel}
                  valueName="Reservations"
                  caption={`Of ${countLabel(reservations.made)} reservations made, ${countLabel(reservations.used)} were used${share(reservations.used, reservations.made)} and ${countLabel(reservations.noShows)} were no-shows${share(reservations.noShows, reservations.made)}.`}
                />
              )
            }
          />
          <ExportCsv range={range} table="reservations" what="the reservations" />
        </div>
      </Panel>

      <Panel title="Refused scans" description="Why stations refused members, and the trainings members lacked: the courses worth running next.">
        <div className="flex flex-col gap-6">
          {denials.length === 0 ? (
            <EmptyState title="No scan was refused in these days">Refusals show here with their reason as stations record them.</EmptyState>
          ) : (
            <div className="flex flex-col gap-4">
              <SideBySide
                first={
                  <BarChartFigure
                    bars={denials.map((row) => ({ key: row.code, label: denialLabels[row.code], value: row.count }))}
                    formatValue={countLabel}
                    valueName="Refused scans"
                    caption={topDenial ? `${countLabel(totalDenials)} refused scans; the commonest reason: ${denialLabels[topDenial.code].toLowerCase()} (${countLabel(topDenial.count)}).` : ''}
                  />
                }
                second={<ReportTable caption="Refused scans by reason" data={denials} columns={denialColumns} getRowId={(row) => row.code} />}
              />
              <ExportCsv range={range} table="denials" what="refused scans by reason" />
            </div>
          )}

          <section aria-labelledby={trainingsHeadingId} className="flex flex-col gap-4">
            <h3 id={trainingsHeadingId} className="text-lg font-bold text-neutral-900">
              Trainings in demand
            </h3>
            {trainingsInDemand.length === 0 ? (
              <EmptyState title="No one was refused for a missing sign-off">When members scan without a training a machine needs, that training shows here.</EmptyState>
            ) : (
              <>
                <SideBySide
                  first={
                    <BarChartFigure
                      bars={trainingsInDemand.map((row) => ({ key: row.trainingId, label: row.trainingName, value: row.count }))}
                      formatValue={countLabel}
                      valueName="Refused scans"
                      caption={topTraining ? `Most asked for: ${topTraining.trainingName}, missing or expired in ${countLabel(topTraining.count)} refused scans.` : ''}
                    />
                  }
                  second={<ReportTable caption="Trainings in demand" data={trainingsInDemand} columns={trainingColumns} getRowId={(row) => row.trainingId} />}
                />
                <ExportCsv range={range} table="trainings" what="trainings in demand" />
              </>
            )}
          </section>
        </div>
      </Panel>

      <Panel title="Sign-offs per instructor" description="Sign-offs each instructor gave in these days.">
        {signOffs.length === 0 ? (
          <EmptyState title="No sign-offs were given in these days">Instructors sign members off under Teach.</EmptyState>
        ) : (
          <div className="flex flex-col gap-4">
            <ReportTable caption="Sign-offs per instructor" data={signOffs} columns={signOffColumns} getRowId={(row) => row.instructorId} />
            <ExportCsv range={range} table="signOffs" what="sign-offs per instructor" />
          </div>
        )}
      </Panel>
    </div>
  );
}
