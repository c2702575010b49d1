import { incidentKindLabels, incidentNoteInputSchema, incidentStatusLabels, incidentStatuses, type Incident, type IncidentStatus } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useAddIncidentNote } from '../api/add-incident-note';
import { incidentPhotoHref } from '../api/get-incident';
import { useUpdateIncidentStatus } from '../api/update-incident-status';
import { IncidentStatusBadge } from './incident-status-badge';
import { incidentPlace } from './incidents-table';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-sm font-bold text-neutral-700">{label}</dt>
      <dd className="text-neutral-900">{children}</dd>
    </div>
  );
}

function StatusForm({ incident }: { incident: Incident }) {
  const update = useUpdateIncidentStatus();
  const [status, setStatus] = useState<IncidentStatus>(incident.status);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  return (
    <form
      noValidate
      className="flex flex-col gap-3 sm:flex-row sm:items-end"
      onSubmit={async (event) => {
        event.preventDefault();
        setError(null);
        setSaved(false);
        try {
          await update.mutateAsync({ id: incident.id, status });
          setSaved(true);
        } catch (failure) {
          setError(errorMessage(failure));
        }
      }}
    >
      <SelectField label="Status" value={status} onChange={(event) => {
          const chosen = incidentStatuses.find((value) => value === event.target.value);
          if (chosen) setStatus(chosen);
        }} containerClassName="flex flex-col gap-1.5 sm:w-56">
        {incidentStatuses.map((value) => (
          <option key={value} value={value}>
            {incidentStatusLabels[value]}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="secondary" pending={update.isPending} disabled={status === incident.status}>
        Save status
      </Button>
      <div aria-live="polite" className="sm:self-center">
        {saved && <span className="font-bold text-success">Status saved.</span>}
      </div>
      {error && <Alert tone="error">{error}</Alert>}
    </form>
  );
}

function NoteForm({ incidentId }: { incidentId: string }) {
  const add = useAddIncidentNote();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(incidentNoteInputSchema), defaultValues: { note: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['note']);
  const onSubmit = handleSubmit(async ({ note }) => {
    setFormError(null);
    try {
      await add.mutateAsync({ id: incidentId, note });
      reset({ note: '' });
    } catch (error) {
      showServerError(error);
    }
  });
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-3">
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextAreaField label="Add a follow-up note" hint="What was found, done or decided. Notes are kept as written and cannot be changed." rows={3} error={errors.note?.message} {...register('note')} />
      <div>
        <Button type="submit" pending={add.isPending}>
          Add note
        </Button>
      </div>
    </form>
  );
}

/** One report for the admins' review: what was reported, its photos, its status and the notes. */
export function IncidentReview({ incident, timeZone }: { incident: Incident; timeZone?: string | undefined }) {
  const place = incidentPlace(incident);
  return (
    <div className="flex flex-col gap-6">
      <Panel title="The report">
        <dl className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <Fact label="Kind">{incidentKindLabels[incident.kind]}</Fact>
          <Fact label="Status">
            <IncidentStatusBadge status={incident.status} />
          </Fact>
          <Fact label="When it happened">{formatDateTime(incident.occurredAt, timeZone)}</Fact>
          <Fact label="Where">{place || 'Not given'}</Fact>
          <Fact label="Machine">{incident.machine?.name ?? 'None'}</Fact>
          <Fact label="Reported by">
            {incident.reportedBy?.name ?? 'Former member'}, {formatDateTime(incident.reportedAt, timeZone)}
          </Fact>
        </dl>
        <div className="mt-4 flex flex-col gap-4">
          <div>
            <h3 className="font-bold text-neutral-900">What happened</h3>
            <p className="max-w-prose whitespace-pre-line text-neutral-900">{incident.description}</p>
          </div>
          <div>
            <h3 className="font-bold text-neutral-900">First aid given</h3>
            <p className="max-w-prose whitespace-pre-line text-neutral-900">{incident.firstAid ?? 'None stated.'}</p>
          </div>
        </div>
      </Panel>

      <Panel title="Photos">
        {incident.photos.length === 0 ? (
          <p className="text-neutral-700">No photos were sent with this report.</p>
        ) : (
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
            {incident.photos.map((photo) => (
              <li key={photo.n}>
                <a href={incidentPhotoHref(incident.id, photo.n)} target="_blank" rel="noreferrer" className="block rounded-md focus-visible:outline-2 focus-visible:outline-brand">
                  <img
                    src={incidentPhotoHref(incident.id, photo.n)}
                    alt={`Photo ${photo.n} of the incident (opens full size)`}
                    className="aspect-square w-full rounded-md border border-neutral-400 bg-neutral-100 object-cover"
                  />
                </a>
              </li>
            ))}
          </ul>
        )}
      </Panel>

      <Panel title="Review">
        <div className="flex flex-col gap-6">
          <StatusForm key={incident.id} incident={incident} />
          <section aria-labelledby="incident-notes" className="flex flex-col gap-3">
            <h3 id="incident-notes" className="text-lg font-bold text-neutral-900">
              Follow-up notes
            </h3>
            {incident.notes.length === 0 ? (
              <p className="text-neutral-700">No notes yet.</p>
            ) : (
              <ol className="flex flex-col gap-3">
                {incident.notes.map((note) => (
                  <li key={note.id} className="rounded-md border border-neutral-300 bg-neutral-50 px-4 py-3">
                    <p className="text-sm text-neutral-700">
                      {note.author?.name ?? 'Former member'} · {formatDateTime(note.at, timeZone)}
                    </p>
                    <p className="whitespace-pre-line text-neutral-900">{note.note}</p>
                  </li>
                ))}
              </ol>
            )}
            <NoteForm incidentId={incident.id} />
          </section>
        </div>
      </Panel>
    </div>
  );
}
