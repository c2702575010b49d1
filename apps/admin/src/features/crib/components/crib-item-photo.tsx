import { PHOTO_MAX_BYTES, type CribItem } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { FileField, UploadProgress } from '../../../components/upload-field';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { errorMessage } from '../../../lib/api-client';
import { formatMegabytes, readAsDataUrl, refusedUploadMessage, uploadFileSchema } from '../../../lib/upload-file';
import { cribItemPhotoHref, useRemoveCribItemPhoto, useUploadCribItemPhoto } from '../api/crib-item-photo';

const limit = formatMegabytes(PHOTO_MAX_BYTES);

// The server's limits for member photos, which item photos share.
const rules = {
  maxBytes: PHOTO_MAX_BYTES,
  types: ['image/jpeg', 'image/png'],
  missing: 'Choose a photo first.',
  wrongType: 'Choose a JPEG or PNG picture. Phones can save or share a photo as JPEG.',
  tooLarge: `That photo is larger than ${limit}. Choose a smaller one, or save it at a lower resolution.`,
};

const formSchema = z.object({ photo: uploadFileSchema(rules) });

/** The item's photo: what the tool looks like, so the attendant takes the right one off the shelf. */
export function CribItemPhoto({ item, onChanged }: { item: CribItem; onChanged: (item: CribItem) => void }) {
  const headingId = useId();
  const upload = useUploadCribItemPhoto();
  const remove = useRemoveCribItemPhoto();
  const [preview, setPreview] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [version, setVersion] = useState(0);
  const [notice, setNotice] = useState<string | null>(null);
  const {
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<z.input<typeof formSchema>, unknown, z.output<typeof formSchema>>({ resolver: zodResolver(formSchema) });
  const { formError, setFormError, showServerError } = useServerErrors(setError, ['photo']);

  const onSubmit = handleSubmit(async ({ photo }) => {
    setFormError(null);
    setNotice(null);
    setProgress(0);
    try {
      const saved = await upload.mutateAsync({ itemId: item.id, photo, onProgress: setProgress });
      reset({ photo: undefined });
      setPreview(null);
      setVersion((v) => v + 1);
      setNotice('The photo is saved.');
      onChanged(saved);
    } catch (error) {
      const refused = refusedUploadMessage(error, rules);
      if (refused) setError('photo', { type: 'server', message: refused }, { shouldFocus: true });
      else showServerError(error);
    } finally {
      setProgress(null);
    }
  });

  const onRemove = async () => {
    setFormError(null);
    setNotice(null);
    try {
      await remove.mutateAsync(item.id);
      setVersion((v) => v + 1);
      setNotice('The photo is removed.');
      onChanged({ ...item, hasPhoto: false });
    } catch (error) {
      setFormError(errorMessage(error));
    }
  };

  return (
    <form noValidate onSubmit={onSubmit} aria-labelledby={headingId} className="flex flex-col gap-3 border-t border-neutral-300 pt-4">
      <h3 id={headingId} className="text-lg font-bold">
        Photo
      </h3>
      {formError && <Alert tone="error">{formError}</Alert>}
      {notice && <Alert tone="success">{notice}</Alert>}
      <div className="flex flex-wrap items-start gap-4">
        <figure className="flex flex-col gap-1">
          {item.hasPhoto ? (
            <img src={cribItemPhotoHref(item.id, version)} alt={`Photo of ${item.name}`} className="aspect-square w-28 rounded-md border border-neutral-400 bg-neutral-100 object-cover" />
          ) : (
            <div className="flex aspect-square w-28 items-center justify-center rounded-md border border-dashed border-neutral-400 bg-neutral-50 p-2 text-center text-sm text-neutral-700">
              No photo yet
            </div>
          )}
          <figcaption className="text-sm text-neutral-700">Now</figcaption>
        </figure>
        {preview && (
          <figure className="flex flex-col gap-1">
            <img src={preview} alt="The photo you chose, before it is uploaded" className="aspect-square w-28 rounded-md border-2 border-brand bg-neutral-100 object-cover" />
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
            hint={`JPEG or PNG, at most ${limit}. The whole tool on a plain background.`}
            error={errors.photo?.message}
            accept="image/jpeg,image/png"
            onFile={(file) => {
              field.onChange(file);
              setNotice(null);
              setPreview(null);
              if (file && file.type.startsWith('image/')) readAsDataUrl(file).then(setPreview, () => setPreview(null));
            }}
          />
        )}
      />
      <UploadProgress progress={progress} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="secondary" pending={upload.isPending}>
          Upload photo
        </Button>
        {item.hasPhoto && (
          <Button variant="quiet" onClick={() => void onRemove()} pending={remove.isPending}>
            Remove photo
          </Button>
        )}
      </div>
    </form>
  );
}
