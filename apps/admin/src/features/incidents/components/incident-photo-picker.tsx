import { useEffect, useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { FieldError } from '../../../components/ui/field';
import { readAsDataUrl } from '../../../lib/upload-file';
import { addPhotos, photoLimitsText } from '../utils/report-form';

interface IncidentPhotoPickerProps {
  photos: readonly File[];
  onChange: (photos: File[]) => void;
  error?: string | undefined;
}

/** data: addresses for the previews (the page's content policy allows those for images, not blob:). */
function usePreviews(photos: readonly File[]): (string | undefined)[] {
  const [urls, setUrls] = useState<(string | undefined)[]>([]);
  useEffect(() => {
    let current = true;
    void Promise.all(photos.map((photo) => readAsDataUrl(photo).catch(() => undefined))).then((read) => {
      if (current) setUrls(read);
    });
    return () => {
      current = false;
    };
  }, [photos]);
  return urls;
}

/** Chooses up to five photos, shows each with a way to take it out again, and states the limits. */
export function IncidentPhotoPicker({ photos, onChange, error }: IncidentPhotoPickerProps) {
  const id = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [refused, setRefused] = useState<string[]>([]);
  const previews = usePreviews(photos);
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const message = [...refused, ...(error ? [error] : [])].join(' ');

  return (
    <fieldset className="flex min-w-0 flex-col gap-2" aria-describedby={[hintId, message ? errorId : null].filter(Boolean).join(' ')}>
      <legend className="mb-1.5 font-bold text-neutral-900">Photos (optional)</legend>
      <p id={hintId} className="-mt-1 text-sm text-neutral-700">
        {photoLimitsText} Photograph the scene, the machine or the damage; leave people&apos;s faces out where you can.
      </p>
      <input
        ref={inputRef}
        id={id}
        type="file"
        accept="image/jpeg,image/png"
        multiple
        className="sr-only"
        // The button below opens it; one tab stop for the one action.
        tabIndex={-1}
        aria-label="Add photos"
        onChange={(event) => {
          const chosen = Array.from(event.target.files ?? []);
          event.target.value = '';
          const { photos: next, refused: left } = addPhotos(photos, chosen);
          setRefused(left);
          onChange(next);
        }}
      />
      <div>
        <Button variant="secondary" onClick={() => inputRef.current?.click()} disabled={photos.length >= 5}>
          {photos.length === 0 ? 'Add photos' : 'Add more photos'}
        </Button>
      </div>
      {message && <FieldError id={errorId}>{message}</FieldError>}
      {photos.length > 0 && (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" aria-label="Chosen photos">
          {photos.map((photo, index) => (
            <li key={`${photo.name}-${index}`} className="flex flex-col gap-1.5">
              {previews[index] && (
                <img src={previews[index]} alt={`Photo ${index + 1}: ${photo.name}`} className="aspect-square w-full rounded-md border border-neutral-400 object-cover" />
              )}
              <Button
                variant="quiet"
                aria-label={`Remove photo ${index + 1} (${photo.name})`}
                onClick={() => {
                  setRefused([]);
                  onChange(photos.filter((_, other) => other !== index));
                }}
              >
                Remove
              </Button>
            </li>
          ))}
        </ul>
      )}
    </fieldset>
  );
}
