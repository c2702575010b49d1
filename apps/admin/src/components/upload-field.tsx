import { useId, type ReactNode, type Ref } from 'react';
import { FieldShell, controlClasses, describedBy, useFieldIds } from './ui/field';

interface FileFieldProps {
  ref: Ref<HTMLInputElement>;
  name: string;
  onBlur: () => void;
  label: string;
  hint: ReactNode;
  error: string | undefined;
  /** The MIME types the server takes, so the browser's file picker offers only those. */
  accept: string;
  /** Receives the chosen file, or nothing when the choice is cleared. */
  onFile: (file: File | undefined) => void;
}

/** A labelled file input whose picker button looks like the other controls. */
export function FileField({ ref, name, onBlur, label, hint, error, accept, onFile }: FileFieldProps) {
  const ids = useFieldIds();
  return (
    <FieldShell ids={ids} label={label} hint={hint} error={error}>
      <input
        ref={ref}
        id={ids.control}
        name={name}
        type="file"
        accept={accept}
        onBlur={onBlur}
        onChange={(event) => onFile(event.target.files?.[0])}
        className={`${controlClasses} file:mr-3 file:min-h-9 file:rounded-md file:border file:border-neutral-500 file:bg-neutral-100 file:px-3 file:font-bold`}
        {...describedBy(ids, hint, error)}
      />
    </FieldShell>
  );
}

/**
 * How far an upload has got, from 0 to 1, so someone on a slow shop connection sees that it
 * is still moving; nothing while no upload runs.
 */
export function UploadProgress({ progress }: { progress: number | null }) {
  const id = useId();
  if (progress === null) return null;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-bold text-neutral-900">
        Uploading… {Math.round(progress * 100)} %
      </label>
      <progress id={id} max={1} value={progress} className="h-3 w-full accent-brand" />
    </div>
  );
}
