import { incidentKindLabels, incidentKinds, type Incident, type IncidentReport } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup, RadioOption } from '../../../components/ui/choice-group';
import { SelectField } from '../../../components/ui/select-field';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { refusedUploadMessage } from '../../../lib/upload-file';
import { useMachines } from '../../machines/api/get-machines';
import { useAreas } from '../../shop/api/get-areas';
import { useReportIncident } from '../api/report-incident';
import { emptyReportForm, photoLimitsText, reportFormSchema, type ReportFormValues } from '../utils/report-form';
import { IncidentPhotoPicker } from './incident-photo-picker';

const kindDescriptions: Record<(typeof incidentKinds)[number], string> = {
  injury: 'Someone was hurt, however slightly. The admins are e-mailed at once.',
  near_miss: 'Nobody was hurt, but someone could have been.',
  damage: 'A machine, tool or part of the shop was damaged.',
};

const fields = ['occurredAt', 'areaId', 'location', 'machineId', 'kind', 'description', 'firstAid'] as const;

const uploadRules = {
  wrongType: 'Each photo must be a JPEG or PNG picture.',
  tooLarge: `A photo is too large. ${photoLimitsText}`,
};

/** The report form: one column, labels above the controls, each error under its field. */
export function IncidentReportForm({ timeZone }: { timeZone: string }) {
  const machines = useMachines();
  const areas = useAreas();
  const report = useReportIncident();
  const [photos, setPhotos] = useState<File[]>([]);
  const [photoError, setPhotoError] = useState<string | undefined>();
  const [sent, setSent] = useState<Incident | null>(null);
  const sentRef = useRef<HTMLDivElement>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<ReportFormValues, unknown, IncidentReport>({
    resolver: zodResolver(reportFormSchema(timeZone)),
    defaultValues: emptyReportForm(timeZone),
  });
  const { formError, setFormError, showServerError } = useServerErrors(setError, fields);
  // The form empties after sending; the confirmation takes focus so a screen reader says it.
  useEffect(() => {
    if (sent) sentRef.current?.focus();
  }, [sent]);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setPhotoError(undefined);
    setSent(null);
    try {
      const incident = await report.mutateAsync({ report: values, photos });
      reset(emptyReportForm(timeZone));
      setPhotos([]);
      setSent(incident);
    } catch (error) {
      const refused = refusedUploadMessage(error, uploadRules);
      if (refused) setPhotoError(refused);
      else showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-xl flex-col gap-5">
      {sent && (
        <Alert tone="success" title="Your report is sent" ref={sentRef} tabIndex={-1}>
          The shop&apos;s admins will review it
          {sent.kind === 'injury' ? ', and have been e-mailed about the injury' : ''}. Thank you for reporting.
        </Alert>
      )}
      {formError && <Alert tone="error">{formError}</Alert>}
      <TextField
        type="datetime-local"
        label="When did it happen?"
        hint="On the shop's clock."
        error={errors.occurredAt?.message}
        className="max-w-64"
        {...register('occurredAt')}
      />
      <SelectField label="Area of the shop" hint="Choose an area, describe the place below, or both." error={errors.areaId?.message} {...register('areaId')}>
        <option value="">Not in one area</option>
        {areas.data?.map((area) => (
          <option key={area.id} value={area.id}>
            {area.name}
          </option>
        ))}
      </SelectField>
      <TextField label="Where exactly (optional)" hint="For example: by the door to the yard." autoComplete="off" error={errors.location?.message} {...register('location')} />
      <SelectField label="Machine (optional)" error={errors.machineId?.message} {...register('machineId')}>
        <option value="">No machine</option>
        {machines.data?.map((machine) => (
          <option key={machine.id} value={machine.id}>
            {machine.name}
          </option>
        ))}
      </SelectField>
      <ChoiceGroup legend="What kind of incident?" error={errors.kind?.message}>
        {incidentKinds.map((kind) => (
          <RadioOption key={kind} value={kind} label={incidentKindLabels[kind]} description={kindDescriptions[kind]} {...register('kind')} />
        ))}
      </ChoiceGroup>
      <TextAreaField
        label="What happened?"
        hint="What you saw, in order. Who was involved is for the admins to ask; facts help more than blame."
        rows={6}
        error={errors.description?.message}
        {...register('description')}
      />
      <TextAreaField label="First aid given (optional)" hint="What was done, and by whom." rows={3} error={errors.firstAid?.message} {...register('firstAid')} />
      <IncidentPhotoPicker
        photos={photos}
        onChange={(next) => {
          setPhotoError(undefined);
          setPhotos(next);
        }}
        error={photoError}
      />
      <div>
        <Button type="submit" pending={report.isPending}>
          Send report
        </Button>
      </div>
    </form>
  );
}
