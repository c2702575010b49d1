import { useState } from 'react';
import { MemberPhoto } from '../../../components/member-photo';
import { PhotoUploadForm } from '../../../components/photo-upload-form';
import { Alert } from '../../../components/ui/alert';
import { Panel } from '../../../components/ui/panel';
import { formatMegabytes, photoRules } from '../../../lib/upload-file';
import { useUploadPhoto } from '../api/upload-photo';

const hint = `JPEG or PNG, at most ${formatMegabytes(photoRules.maxBytes)}. Your face, clearly, like a passport photo: it is printed on your badge card so that instructors know who you are.`;

export function PhotoPanel({ memberId, name }: { memberId: string; name: string }) {
  const upload = useUploadPhoto();
  const [saved, setSaved] = useState(false);

  return (
    <Panel title="My photo">
      <PhotoUploadForm
        header={saved && <Alert tone="success">Your photo is saved. It is on your next printed badge card.</Alert>}
        current={(version) => <MemberPhoto memberId={memberId} name={name} version={version} className="w-28" />}
        previewClassName="aspect-[4/5]"
        hint={hint}
        send={(photo, onProgress) => upload.mutateAsync({ memberId, photo, onProgress })}
        pending={upload.isPending}
        onStart={() => setSaved(false)}
        onSaved={() => setSaved(true)}
      />
    </Panel>
  );
}
