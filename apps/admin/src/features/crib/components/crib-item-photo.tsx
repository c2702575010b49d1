import type { CribItem } from '@chuckkey/core';
import { useId, useState } from 'react';
import { PhotoUploadForm } from '../../../components/photo-upload-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/api-client';
import { formatMegabytes, photoRules } from '../../../lib/upload-file';
import { cribItemPhotoHref, useRemoveCribItemPhoto, useUploadCribItemPhoto } from '../api/crib-item-photo';

const hint = `JPEG or PNG, at most ${formatMegabytes(photoRules.maxBytes)}. The whole tool on a plain background.`;

/** The item's photo: what the tool looks like, so the attendant takes the right one off the shelf. */
export function CribItemPhoto({ item, onChanged }: { item: CribItem; onChanged: (item: CribItem) => void }) {
  const headingId = useId();
  const upload = useUploadCribItemPhoto();
  const remove = useRemoveCribItemPhoto();
  const [notice, setNotice] = useState<string | null>(null);
  const [removeError, setRemoveError] = useState<string | null>(null);

  const onStart = () => {
    setNotice(null);
    setRemoveError(null);
  };

  const onRemove = async () => {
    onStart();
    try {
      await remove.mutateAsync(item.id);
      setNotice('The photo is removed.');
      onChanged({ ...item, hasPhoto: false });
    } catch (error) {
      setRemoveError(errorMessage(error));
    }
  };

  return (
    <PhotoUploadForm
      aria-labelledby={headingId}
      className="border-t border-neutral-300 pt-4"
      header={
        <>
          <h3 id={headingId} className="text-lg font-bold">
            Photo
          </h3>
          {removeError && <Alert tone="error">{removeError}</Alert>}
          {notice && <Alert tone="success">{notice}</Alert>}
        </>
      }
      current={(version) =>
        item.hasPhoto ? (
          <img
            src={cribItemPhotoHref(item.id, version)}
            alt={`Photo of ${item.name}`}
            className="aspect-square w-28 rounded-md border border-neutral-400 bg-neutral-100 object-cover"
          />
        ) : (
          <div className="flex aspect-square w-28 items-center justify-center rounded-md border border-dashed border-neutral-400 bg-neutral-50 p-2 text-center text-sm text-neutral-700">
            No photo yet
          </div>
        )
      }
      previewClassName="aspect-square"
      hint={hint}
      send={async (photo, onProgress) => {
        const saved = await upload.mutateAsync({ itemId: item.id, photo, onProgress });
        onChanged(saved);
      }}
      pending={upload.isPending}
      onStart={onStart}
      onSaved={() => setNotice('The photo is saved.')}
      submitVariant="secondary"
      actions={
        item.hasPhoto && (
          <Button variant="quiet" onClick={() => void onRemove()} pending={remove.isPending}>
            Remove photo
          </Button>
        )
      }
    />
  );
}
