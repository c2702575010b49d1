import { zodResolver } from '@hookform/resolvers/zod';
import { useState, type ReactNode } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { z } from 'zod';
import { useServerErrors } from '../hooks/use-server-errors';
import { photoRules, readAsDataUrl, refusedUploadMessage, uploadFileSchema } from '../lib/upload-file';
import { Alert } from './ui/alert';
import { Button } from './ui/button';
import { cn } from './ui/cn';
import { FileField, UploadProgress } from './upload-field';

const formSchema = z.object({ photo: uploadFileSchema(photoRules) });

interface PhotoUploadFormProps {
  /** Above the form's own error: a heading, the notices of what last happened. */
  header?: ReactNode;
  /** The picture on file now; `version` changes after each upload so the browser fetches it again. */
  current: (version: number) => ReactNode;
  /** The shape of the chosen picture's preview, the same as the one on file. */
  previewClassName: string;
  hint: string;
  send: (photo: File, onProgress: (fraction: number) => void) => Promise<unknown>;
  pending: boolean;
  /** A new file was chosen or is being sent: the notice of the last one is out of date. */
  onStart: () => void;
  onSaved: () => void;
  submitVariant?: 'primary' | 'secondary';
  /** Beside the upload button, such as removing the photo. */
  actions?: ReactNode;
  className?: string;
  'aria-labelledby'?: string;
}

/**
 * Choosing a photo, seeing it beside the one on file before it goes, and sending it with its
 * progress. Wrong kinds and sizes are caught here first; the server's refusals read the same.
 */
export function PhotoUploadForm({
  header,
  current,
  previewClassName,
  hint,
  send,
  pending,
  onStart,
  onSaved,
  submitVariant,
  actions,
  className,
  'aria-labelledby': labelledBy,
}: PhotoUploadFormProps) {
  const [preview, setPreview] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [version, setVersion] = useState(0);
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
    onStart();
    setProgress(0);
    try {
      await send(photo, setProgress);
      reset({ photo: undefined });
      setPreview(null);
      setVersion((v) => v + 1);
      onSaved();
    } catch (error) {
      const refused = refusedUploadMessage(error, photoRules);
      if (refused) setError('photo', { type: 'server', message: refused }, { shouldFocus: true });
      else showServerError(error);
    } finally {
      setProgress(null);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-labelledby={labelledBy} className={cn('flex flex-col gap-4', className)}>
      {header}
      {formError && <Alert tone="error">{formError}</Alert>}
      <div className="flex flex-wrap items-start gap-4">
        <figure className="flex flex-col gap-1">
          {current(version)}
          <figcaption className="text-sm text-neutral-700">Now</figcaption>
        </figure>
        {preview && (
          <figure className="flex flex-col gap-1">
            <div className={cn('w-28 overflow-hidden rounded-md border-2 border-brand bg-neutral-100', previewClassName)}>
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
            accept={photoRules.types.join(',')}
            onFile={(file) => {
              field.onChange(file);
              onStart();
              setPreview(null);
              if (file && file.type.startsWith('image/')) readAsDataUrl(file).then(setPreview, () => setPreview(null));
            }}
          />
        )}
      />
      <UploadProgress progress={progress} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant={submitVariant} pending={pending}>
          Upload photo
        </Button>
        {actions}
      </div>
    </form>
  );
}
