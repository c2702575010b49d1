import { WAIVER_SCAN_MAX_BYTES } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { FileField, UploadProgress } from '../../../components/upload-field';
import { Button } from '../../../components/ui/button';
import { WarningIcon } from '../../../components/ui/icons';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { formatMegabytes, refusedUploadMessage, uploadFileSchema } from '../../../lib/upload-file';
import { useMemberWaiver } from '../api/get-member-waiver';
import { useUploadWaiverScan, waiverScanHref } from '../api/upload-waiver-scan';
import { WaiverOnFile } from './waiver-status-line';

const limit = formatMegabytes(WAIVER_SCAN_MAX_BYTES);

const rules = {
  maxBytes: WAIVER_SCAN_MAX_BYTES,
  types: ['application/pdf', 'image/jpeg', 'image/png'],
  missing: 'Choose the scanned file first.',
  wrongType: 'Choose a PDF, JPEG or PNG file.',
  tooLarge: `That file is larger than ${limit}. Scan at a lower resolution, or in black and white.`,
};

const formSchema = z.object({ scan: uploadFileSchema(rules) });

function ScanForm({ memberId, version }: { memberId: string; version: number }) {
  const upload = useUploadWaiverScan();
  const [progress, setProgress] = useState<number | null>(null);
  const {
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof formSchema>, unknown, z.output<typeof formSchema>>({ resolver: zodResolver(formSchema) });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['scan']);
  const hint = `PDF, JPEG or PNG of the paper copy this member signed for version ${version}, at most ${limit}.`;

  const onSubmit = handleSubmit(async ({ scan }) => {
    setFormError(null);
    setProgress(0);
    try {
      await upload.mutateAsync({ memberId, scan, onProgress: setProgress });
    } catch (error) {
      const refused = refusedUploadMessage(error, rules);
      if (refused) setError('scan', { type: 'server', message: refused }, { shouldFocus: true });
      else showServerError(error);
    } finally {
      setProgress(null);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <Controller
        control={control}
        name="scan"
        render={({ field }) => (
          <FileField
            ref={field.ref}
            name={field.name}
            onBlur={field.onBlur}
            label="Signed waiver scan"
            hint={hint}
            error={errors.scan?.message}
            accept="application/pdf,image/jpeg,image/png"
            onFile={field.onChange}
          />
        )}
      />
      <UploadProgress progress={progress} />
      <div>
        <Button type="submit" pending={upload.isPending}>
          Upload signed waiver
        </Button>
      </div>
    </form>
  );
}

/** For admins on a member's record: whether the waiver is on file, and a scanned paper copy when it is not. */
export function MemberWaiverPanel({ memberId, timeZone }: { memberId: string; timeZone: string | undefined }) {
  const status = useMemberWaiver(memberId);

  return (
    <Panel title="Safety waiver">
      {status.isPending ? (
        <Spinner label="Loading the waiver…" />
      ) : status.isError ? (
        <QueryError error={status.error} what="the waiver" onRetry={() => void status.refetch()} retrying={status.isFetching} />
      ) : !status.data.current ? (
        <p className="text-neutral-800">
          The shop has no waiver yet. <TextLink to={paths.setupWaiver.getHref()}>Publish one under Setup</TextLink>.
        </p>
      ) : (
        <div className="flex flex-col gap-4">
          {status.data.onFile && status.data.record ? (
            <WaiverOnFile record={status.data.record} timeZone={timeZone} />
          ) : (
            <p className="flex items-start gap-2 text-neutral-900">
              <WarningIcon className="mt-0.5 size-5 shrink-0 text-warning" />
              <span>
                <strong>Not on file</strong> for version {status.data.current.version}. Stations clear this member for no machine
                until they accept it online or you upload their signed copy.
              </span>
            </p>
          )}
          {status.data.record?.method === 'uploaded_scan' && (
            <p>
              <a href={waiverScanHref(memberId)} target="_blank" rel="noreferrer" className="font-bold text-brand underline underline-offset-4">
                Open the scanned copy
              </a>
            </p>
          )}
          {!status.data.onFile && <ScanForm memberId={memberId} version={status.data.current.version} />}
        </div>
      )}
    </Panel>
  );
}
