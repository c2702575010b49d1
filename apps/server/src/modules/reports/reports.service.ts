import {
  toCsv,
  type CsvColumn,
  type UsageCsvTable,
  type UsageDayRow,
  type UsageDenial,
  type UsageHeatmapCell,
  type UsageMachineRow,
  type UsageMemberRow,
  type UsageReport,
  type UsageReportQuery,
  type UsageReservations,
  type UsageSignOffs,
  type UsageTrainingDemand,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { reportsRepository, type ReportRange } from './reports.repository';

const machineColumns: CsvColumn<UsageMachineRow>[] = [
  { header: 'Machine', value: (r) => r.machineName },
  { header: 'Sessions', value: (r) => r.sessions },
  { header: 'Hours', value: (r) => r.hours },
  { header: 'Open hours', value: (r) => r.openHours },
  { header: 'Utilization', value: (r) => r.utilization },
];
const memberColumns: CsvColumn<UsageMemberRow>[] = [
  { header: 'Member', value: (r) => r.memberName },
  { header: 'Sessions', value: (r) => r.sessions },
  { header: 'Hours', value: (r) => r.hours },
];
const dayColumns: CsvColumn<UsageDayRow>[] = [
  { header: 'Date', value: (r) => r.date },
  { header: 'Sessions', value: (r) => r.sessions },
  { header: 'Hours', value: (r) => r.hours },
];
const heatmapColumns: CsvColumn<UsageHeatmapCell>[] = [
  { header: 'Weekday', value: (r) => r.weekday },
  { header: 'Hour', value: (r) => r.hour },
  { header: 'Hours', value: (r) => r.hours },
];
const reservationColumns: CsvColumn<UsageReservations>[] = [
  { header: 'Made', value: (r) => r.made },
  { header: 'Used', value: (r) => r.used },
  { header: 'No-shows', value: (r) => r.noShows },
  { header: 'Cancelled', value: (r) => r.cancelled },
];
const denialColumns: CsvColumn<UsageDenial>[] = [
  { header: 'Reason', value: (r) => r.code },
  { header: 'Rule', value: (r) => r.rule },
  { header: 'Count', value: (r) => r.count },
];
const trainingColumns: CsvColumn<UsageTrainingDemand>[] = [
  { header: 'Training', value: (r) => r.trainingName },
  { header: 'Refusals', value: (r) => r.count },
];
const signOffColumns: CsvColumn<UsageSignOffs>[] = [
  { header: 'Instructor', value: (r) => r.instructorName },
  { header: 'Sign-offs', value: (r) => r.count },
];

/** One table of the report as RFC 4180 CSV, through the project's one writer. */
export function usageCsv(report: UsageReport, table: UsageCsvTable): string {
  switch (table) {
    case 'rows':
      if (report.groupBy === 'machine') return toCsv(report.rows, machineColumns);
      if (report.groupBy === 'member') return toCsv(report.rows, memberColumns);
      return toCsv(report.rows, dayColumns);
    case 'heatmap':
      return toCsv(report.heatmap, heatmapColumns);
    case 'reservations':
      return toCsv([report.reservations], reservationColumns);
    case 'denials':
      return toCsv(report.denials, denialColumns);
    case 'trainings':
      return toCsv(report.trainingsInDemand, trainingColumns);
    case 'signOffs':
      return toCsv(report.signOffs, signOffColumns);
  }
}

/** The download's name says what it holds and the range, e.g. usage-machine-2026-09-01-to-2026-11-30.csv. */
export function usageCsvFilename(report: UsageReport, table: UsageCsvTable): string {
  const what = table === 'rows' ? report.groupBy : table === 'signOffs' ? 'sign-offs' : table;
  return `usage-${what}-${report.from}-to-${report.to}.csv`;
}

export function reportsService({ db }: Deps) {
  const repo = reportsRepository(db);

  return {
    /** Every figure of the usage review for the range; the statements run side by side, the rows and heatmap in one. */
    async usage(query: Pick<UsageReportQuery, 'from' | 'to' | 'groupBy'>): Promise<UsageReport> {
      await repo.refreshTotals();
      const range: ReportRange = { from: query.from, to: query.to, timeZone: await repo.timeZone() };
      const [[grouped], [reservations], denials, trainingsInDemand, signOffs] = await Promise.all([
        repo.rows<{ rows: UsageMachineRow[] | UsageMemberRow[] | UsageDayRow[]; heatmap: UsageHeatmapCell[] }>(query.groupBy, range),
        repo.rows<UsageReservations>('reservations', range),
        repo.rows<UsageDenial>('denials', range),
        repo.rows<UsageTrainingDemand>('trainings', range),
        repo.rows<UsageSignOffs>('signOffs', range),
      ]);
      const common = {
        from: query.from,
        to: query.to,
        timeZone: range.timeZone,
        heatmap: grouped?.heatmap ?? [],
        reservations: reservations ?? { made: 0, used: 0, noShows: 0, cancelled: 0 },
        denials,
        trainingsInDemand,
        signOffs,
      };
      // The statement run was chosen by groupBy, so its rows are of that grouping.
      const rows = grouped?.rows ?? [];
      if (query.groupBy === 'machine') return { ...common, groupBy: 'machine', rows: rows as UsageMachineRow[] };
      if (query.groupBy === 'member') return { ...common, groupBy: 'member', rows: rows as UsageMemberRow[] };
      return { ...common, groupBy: 'day', rows: rows as UsageDayRow[] };
    },
  };
}
