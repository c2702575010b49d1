import { stationTagOutReasons, tagOutCreateSchema, type StationTagOutResult } from '@chuckkey/core';
import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { isApiError } from '@/lib/api-client';
import { BadgeReader } from '../../station/components/badge-reader';
import { stationMessage } from '../../station/utils/messages';
import { useReportTagOut } from '../api/report-tag-out';
import { OTHER, reportReason } from '../utils/report-reason';

const REPORT_IDLE_MS = 90_000;

interface ReportProblemProps {
  /**
   * Who reports: a badge already scanned (an instructor at the menu), `'running'` for the
   * member of the running session, or `'scan'` to ask for a badge first.
   */
  reporter: { badge: string } | 'running' | 'scan';
  /** A session runs on the machine: the member is told to stop it safely, and reporting ends it. */
  sessionRunning: boolean;
  onReported: (result: StationTagOutResult) => void;
  onCancel: () => void;
}

/** "Report a problem": the machine is tagged out at once with the reason, and the admins are told. */
export function ReportProblem({ reporter, sessionRunning, onReported, onCancel }: ReportProblemProps) {
  const [badge, setBadge] = useState<string | null>(typeof reporter === 'object' ? reporter.badge : null);
  const [choice, setChoice] = useState<string | null>(null);
  const [detail, setDetail] = useState('');
  const [invalid, setInvalid] = useState<string | null>(null);
  const report = useReportTagOut();
  const detailId = useId();
  const headingId = useId();
  useIdleReturn(REPORT_IDLE_MS, onCancel);

  const submit = () => {
    if (!choice) return;
    const parsed = tagOutCreateSchema.safeParse({ reason: reportReason(choice, detail) });
    if (!parsed.success) {
      setInvalid(choice === OTHER ? 'Say in a few words what is wrong.' : (parsed.error.issues[0]?.message ?? 'Say what is wrong.'));
      return;
    }
    setInvalid(null);
    report.mutate(
      { reason: parsed.data.reason, ...(badge ? { badge } : {}) },
      {
        onSuccess: onReported,
        // A badge the server does not take is asked for again; the chosen reason is kept.
        onError: (error) => {
          if (reporter === 'scan' && isApiError(error) && (error.code === 'unknown_badge' || error.code === 'member_inactive')) setBadge(null);
        },
      },
    );
  };

  if (reporter === 'scan' && !badge) {
    return (
      <section aria-labelledby={headingId} className="flex w-full max-w-4xl flex-col items-center gap-6 text-center">
        <h1 id={headingId} className="flex items-center gap-5 text-kiosk-title font-bold">
          <Icon name="warning" className="size-14" />
          Report a problem
        </h1>
        <BadgeReader
          prompt="Scan your badge: the report says who found the problem"
          onBadge={setBadge}
          message={report.error ? stationMessage(report.error) : undefined}
        />
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </section>
    );
  }

  return (
    <section aria-labelledby={headingId} className="flex w-full max-w-5xl flex-col gap-6">
      <h1 id={headingId} className="flex items-center gap-5 text-kiosk-title font-bold">
        <Icon name="warning" className="size-14" />
        Report a problem
      </h1>
      {sessionRunning ? (
        <p role="alert" className="rounded-xl border-4 border-state-tagged-out px-6 py-4 text-kiosk-lead font-bold">
          Stop the machine safely first. Reporting ends the session.
        </p>
      ) : null}
      <p className="text-kiosk-body">The machine is tagged out at once, and the shop’s admins are told. What is wrong?</p>
      <div role="group" aria-label="What is wrong" className="grid gap-4 landscape:grid-cols-3 portrait:grid-cols-2">
        {[...stationTagOutReasons, OTHER].map((reason) => (
          <Button
            key={reason}
            variant={choice === reason ? 'primary' : 'quiet'}
            aria-pressed={choice === reason}
            onClick={() => {
              setChoice(reason);
              setInvalid(null);
            }}
            className="min-h-24 w-full"
          >
            {reason}
          </Button>
        ))}
      </div>
      {choice ? (
        <div className="flex flex-col gap-2">
          <label htmlFor={detailId} className="text-kiosk-body font-bold">
            {choice === OTHER ? 'What is wrong?' : 'More detail (optional)'}
          </label>
          <textarea
            id={detailId}
            value={detail}
            maxLength={400}
            rows={2}
            onChange={(event) => setDetail(event.target.value)}
            aria-invalid={invalid ? true : undefined}
            className="rounded-lg border-4 border-ink-muted bg-surface-raised px-5 py-3 text-kiosk-body text-ink focus:border-ink focus:outline-none"
          />
        </div>
      ) : null}
      {invalid || report.error ? (
        <p role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
          <Icon name="warning" className="size-9" />
          {invalid ?? stationMessage(report.error)}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-4">
        <Button onClick={submit} disabled={!choice || report.isPending} className="min-h-24">
          <Icon name="padlock" className="size-10" />
          {report.isPending ? 'Tagging out…' : 'Tag out this machine'}
        </Button>
        <Button variant="quiet" onClick={onCancel} className="min-h-24">
          Cancel
        </Button>
      </div>
    </section>
  );
}
