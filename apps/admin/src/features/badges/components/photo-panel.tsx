import { PHOTO_MAX_BYTES } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { MemberPhoto } from '../../../components/member-photo';
import { FileField, UploadProgress } from '../../../components/upload-field';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Panel } from '../../../components/ui/panel';
import { useServerErrors } from '../../../hooks/use-server-errors';
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
  const [preview, setPreview] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [version, setVersion] = useState(0);
  const [saved, setSaved] = useState(false);
  const {
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<z.input<typeof formSchema>, unknown, z.output<typeof formSchema>>({ resolver: zodResolver(formSchema) });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['photo']);

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
      else showServerError(error);
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
            <FileField
              key={version}
              ref={field.ref}
              name={field.name}
              onBlur={field.onBlur}
              label="Choose a photo"
              hint={hint}
              error={errors.photo?.message}
              accept="image/jpeg,image/png"
              onFile={(file) => {
                field.onChange(file);
                setSaved(false);
                setPreview(null);
                if (file && file.type.startsWith('image/')) readAsDataUrl(file).then(setPreview, () => setPreview(null));
              }}
            />
          )}
        />
        <UploadProgress progress={progress} />
        <div>
          <Button type="submit" pending={upload.isPending}>
            Upload photo
          </Button>
        </div>
      </form>
    </Panel>
  );
}
