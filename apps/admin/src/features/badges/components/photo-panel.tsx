import { PHOTO_MAX_BYTES } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { MemberPhoto } from '../../../components/member-photo';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { FieldShell, controlClasses, describedBy, useFieldIds } from '../../../components/ui/field';
import { Panel } from '../../../components/ui/panel';
import { applyServerErrors } from '../../../lib/form-errors';
import { formatMegabytes, readAsDataUrl, refusedUploadMessage, uploadFileSchema } from '../../../lib/upload-file';
import { useUploadPhoto } from '../api/upload-photo';

const limit = formatMegabytes(PHOTO_MAX_BYTES);

const rules = {
  maxBytes: PHOTO_MAX_BYTES,
  types: ['image/jpeg', 'image/png'],
  missing: 'Choose a photo first.',
  wrongType: 'Choose a JPEG or PNG picture. Phones can save or share a photo as JPEG.',
  tooLarge: `That photo is larger than ${limit}. Choose a smaller one, or save it at a lower resolution.`,
};

const formSchema = z.object({ photo: uploadFileSchema(rules) });

export function PhotoPanel({ memberId, name }: { memberId: string; name: string }) {
  const upload = useUploadPhoto();
  const ids = useFieldIds();
  const progressId = useId();
  const [preview, setPreview] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const [version, setVersion] = useState(0);
  const [saved, setSaved] = useState(false);
  const {
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<z.input<typeof formSchema>, unknown, z.output<typeof formSchema>>({ resolver: zodResolver(formSchema) });

  const hint = `JPEG or PNG, at most ${limit}. Your face, clearly, like a passport photo: it is printed on your badge card so that instructors know who you are.`;

  const onSubmit = handleSubmit(async ({ photo }) => {
    setFormError(null);
    setSaved(false);
    setProgress(0);
    try {
      await upload.mutateAsync({ memberId, photo, onProgress: setProgress });
      reset({ photo: undefined });
      setPreview(null);
      setVersion((v) => v + 1);
      setSaved(true);
    } catch (error) {
      const refused = refusedUploadMessage(error, rules);
      if (refused) setError('photo', { type: 'server', message: refused }, { shouldFocus: true });
      else setFormError(applyServerErrors(error, setError, ['photo']));
    } finally {
      setProgress(null);
    }
  });

  return (
    <Panel title="My photo">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {formError && <Alert tone="error">{formError}</Alert>}
        {saved && <Alert tone="success">Your photo is saved. It is on your next printed badge card.</Alert>}
        <div className="flex flex-wrap items-start gap-4">
          <figure className="flex flex-col gap-1">
            <MemberPhoto memberId={memberId} name={name} version={version} className="w-28" />
            <figcaption className="text-sm text-neutral-700">Now</figcaption>
          </figure>
          {preview && (
            <figure className="flex flex-col gap-1">
              <div className="aspect-[4/5] w-28 overflow-hidden rounded-md border-2 border-brand bg-neutral-100">
                <img src={preview} alt="The photo you chose, before it is uploaded" className="size-full object-cover" />
              </div>
              <figcaption className="text-sm text-neutral-700">Chosen</figcaption>
            </figure>
          )}
        </div>
        <Controller
          control={control}
          name="photo"
          render={({ field }) => (
            <FieldShell ids={ids} label="Choose a photo" hint={hint} error={errors.photo?.message}>
              <input
                key={version}
                ref={field.ref}
                id={ids.control}
                name={field.name}
                type="file"
                accept="image/jpeg,image/png"
                onBlur={field.onBlur}
                onChange={(event) => {
                  const file = event.target.files?.[0];
                  field.onChange(file);
                  setSaved(false);
                  setPreview(null);
                  if (file && file.type.startsWith('image/')) readAsDataUrl(file).then(setPreview, () => setPreview(null));
                }}
                className={`${controlClasses} file:mr-3 file:min-h-9 file:rounded-md file:border file:border-neutral-500 file:bg-neutral-100 file:px-3 file:font-bold`}
                {...describedBy(ids, hint, errors.photo?.message)}
              />
            </FieldShell>
          )}
        />
        {progress !== null && (
          <div className="flex flex-col gap-1">
            <label htmlFor={progressId} className="text-sm font-bold text-neutral-900">
              Uploading… {Math.round(progress * 100)} %
            </label>
            <progress id={progressId} max={1} value={progress} className="h-3 w-full accent-brand" />
          </div>
        )}
        <div>
          <Button type="submit" pending={upload.isPending}>
            Upload photo
          </Button>
        </div>
      </form>
    </Panel>
  );
}
