import { waiverPublishSchema, type WaiverPublish } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { formatDate } from '../../../lib/format';
import { useCurrentWaiver } from '../api/get-current-waiver';
import { usePublishWaiver } from '../api/publish-waiver';

export function WaiverPublisher({ timeZone }: { timeZone: string | undefined }) {
  const current = useCurrentWaiver();
  const publish = usePublishWaiver();
  const [pending, setPending] = useState<WaiverPublish | null>(null);
  const [published, setPublished] = useState<number | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(waiverPublishSchema), defaultValues: { title: '', body: '' } });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['title', 'body']);

  const nextVersion = (current.data?.version ?? 0) + 1;

  async function confirm() {
    if (!pending) return;
    setFormError(null);
    try {
      const version = await publish.mutateAsync(pending);
      setPending(null);
      reset({ title: '', body: '' });
      setPublished(version.version);
    } catch (error) {
      setPending(null);
      showServerError(error);
    }
  }

  return (
    <div className="grid grid-cols-1 items-start gap-6 xl:grid-cols-2">
      <Panel title="Current waiver">
        {current.isPending ? (
          <Spinner label="Loading the waiver…" />
        ) : current.isError ? (
          <QueryError error={current.error} what="the waiver" onRetry={() => void current.refetch()} retrying={current.isFetching} />
        ) : !current.data ? (
          <p className="text-neutral-800">None yet. Members have nothing to accept until you publish the first version.</p>
        ) : (
          <article aria-labelledby="current-waiver-title" className="flex flex-col gap-2">
            <h3 id="current-waiver-title" className="text-lg font-bold text-neutral-900">
              {current.data.title}
            </h3>
            <p className="text-sm text-neutral-700">
              Version {current.data.version}, published {formatDate(current.data.publishedAt, timeZone)}
            </p>
            <div
              role="region"
              aria-label="Text of the current waiver"
              tabIndex={0}
              className="max-h-96 overflow-y-auto rounded-md border border-neutral-300 bg-neutral-50 p-3 leading-relaxed whitespace-pre-wrap"
            >
              {current.data.body}
            </div>
          </article>
        )}
      </Panel>

      <Panel title="Publish a new version">
        <form noValidate onSubmit={handleSubmit((values) => setPending(values))} className="flex flex-col gap-4">
          {formError && <Alert tone="error">{formError}</Alert>}
          {published !== null && (
            <Alert tone="success" title={`Version ${published} is published`}>
              Every member is asked to accept it the next time they open My record.
            </Alert>
          )}
          <Alert tone="warning" title="Everyone will be asked again">
            A new version replaces the current one for every member. Until a member accepts it (or you scan in their signed copy),
            their waiver is not on file and stations clear them for no machine. Have the text checked against the shop&apos;s rules
            and local law first.
          </Alert>
          {current.data && (
            <div>
              <Button
                variant="secondary"
                onClick={() => current.data && reset({ title: current.data.title, body: current.data.body })}
              >
                Start from the current text
              </Button>
            </div>
          )}
          <TextField label="Title" autoComplete="off" error={errors.title?.message} {...register('title')} />
          <TextAreaField label="Waiver text" rows={12} error={errors.body?.message} {...register('body')} />
          <div>
            <Button type="submit">Publish version {nextVersion}…</Button>
          </div>
        </form>
      </Panel>

      <ConfirmDialog
        open={pending !== null}
        title={`Publish version ${nextVersion} and ask everyone again?`}
        confirmLabel={`Publish version ${nextVersion}`}
        confirmVariant="danger"
        pending={publish.isPending}
        onCancel={() => {
          publish.reset();
          setPending(null);
        }}
        onConfirm={() => void confirm()}
      >
        From now on no member has a waiver on file until they accept version {nextVersion}. Members who are on a machine right now
        can finish their session.
      </ConfirmDialog>
    </div>
  );
}
