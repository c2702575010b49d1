import { waiverAcceptSchema, type WaiverVersion } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { WarningIcon } from '../../../components/ui/icons';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { ApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useAcceptWaiver } from '../api/accept-waiver';
import { useMemberWaiver } from '../api/get-member-waiver';
import { WaiverOnFile } from './waiver-status-line';

interface AcceptFormProps {
  waiver: WaiverVersion;
  name: string;
}

function AcceptForm({ waiver, name }: AcceptFormProps) {
  const accept = useAcceptWaiver();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof waiverAcceptSchema>, unknown, z.output<typeof waiverAcceptSchema>>({
    resolver: zodResolver(waiverAcceptSchema),
    defaultValues: { version: waiver.version, typedName: '' },
  });

  const errorOptions = {
    codeFields: { name_mismatch: 'typedName' as const },
    messages: {
      name_mismatch: `That is not the name the shop has for you (${name}). Type it as it is, or correct it under Profile first.`,
      outdated_version: 'The shop published a new version while you were reading. Read the new text, then accept again.',
    },
  };
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['typedName'], errorOptions);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await accept.mutateAsync(values);
    } catch (error) {
      if (error instanceof ApiError && error.code === 'outdated_version') {
        setFormError(errorOptions.messages.outdated_version);
        return;
      }
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <input type="hidden" {...register('version')} />
      <TextField
        label="Type your full name"
        hint={`As the shop has it: ${name}. Typing it and pressing “I accept” signs the waiver, version ${waiver.version}.`}
        autoComplete="name"
        error={errors.typedName?.message}
        {...register('typedName')}
      />
      <div>
        <Button type="submit" pending={accept.isPending}>
          I accept
        </Button>
      </div>
    </form>
  );
}

interface WaiverPanelProps {
  memberId: string;
  name: string;
  timeZone: string | undefined;
}

export function WaiverPanel({ memberId, name, timeZone }: WaiverPanelProps) {
  const status = useMemberWaiver(memberId);

  return (
    <Panel title="Safety waiver">
      <div id="waiver" className="flex flex-col gap-4">
        {status.isPending ? (
          <Spinner label="Loading the waiver…" />
        ) : status.isError ? (
          <QueryError error={status.error} what="the waiver" onRetry={() => void status.refetch()} retrying={status.isFetching} />
        ) : !status.data.current ? (
          <EmptyState title="There is no waiver to accept yet">
            When the shop publishes its safety waiver, it appears here for you to read and accept.
          </EmptyState>
        ) : status.data.onFile && status.data.record ? (
          <WaiverOnFile record={status.data.record} timeZone={timeZone} />
        ) : (
          <>
            <p className="flex items-start gap-2 text-neutral-900">
              <WarningIcon className="mt-0.5 size-5 shrink-0 text-warning" />
              <span>
                <strong>Not on file yet.</strong> Read the waiver to the end, then sign it below.
              </span>
            </p>
            <article aria-labelledby="waiver-title" className="flex flex-col gap-2 rounded-md border border-neutral-300 bg-neutral-50 p-4">
              <h3 id="waiver-title" className="text-lg font-bold text-neutral-900">
                {status.data.current.title}
              </h3>
              <p className="text-sm text-neutral-700">
                Version {status.data.current.version}, published {formatDate(status.data.current.publishedAt, timeZone)}
              </p>
              <div className="max-w-prose leading-relaxed whitespace-pre-wrap text-neutral-900">{status.data.current.body}</div>
            </article>
            <AcceptForm key={status.data.current.version} waiver={status.data.current} name={name} />
          </>
        )}
      </div>
    </Panel>
  );
}
