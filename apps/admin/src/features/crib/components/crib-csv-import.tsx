import { useId, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { buttonClasses } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import { UploadIcon } from '../../../components/ui/icons';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { useImportCribItems, type CribImportResult } from '../api/import-crib-items';

type Outcome = { result: CribImportResult } | { message: string; lines: string[] };

/** "line 4.assetTag" → "Line 4, asset tag": the server names each bad cell by its record and field. */
function lineErrors(error: unknown): string[] {
  if (!(error instanceof ApiError)) return [];
  return Object.entries(error.fieldErrors).flatMap(([key, messages]) => {
    const match = /^line (\d+)\.(.+)$/.exec(key);
    const where = match ? `Line ${match[1]}, ${match[2]!.replace(/([A-Z])/g, ' $1').toLowerCase()}` : key;
    return messages.map((message) => `${where}: ${message}`);
  });
}

function countText(count: number, one: string, many: string) {
  return `${count} ${count === 1 ? one : many}`;
}

/** Reads a CSV file in the export's columns and sends it whole: either every row lands, or none does. */
export function CribCsvImport({ className }: { className?: string }) {
  const id = useId();
  const importItems = useImportCribItems();
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [inputKey, setInputKey] = useState(0);

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    setOutcome(null);
    try {
      const result = await importItems.mutateAsync(await file.text());
      setOutcome({ result });
    } catch (error) {
      setOutcome({ message: errorMessage(error), lines: lineErrors(error) });
    } finally {
      // A fresh input, so choosing the same file again after fixing it still imports it.
      setInputKey((key) => key + 1);
    }
  };

  return (
    <>
      <label
        htmlFor={id}
        aria-busy={importItems.isPending || undefined}
        className={cn(buttonClasses('secondary'), 'cursor-pointer has-focus-visible:outline-3 has-focus-visible:outline-brand-ring', className)}
      >
        {importItems.isPending ? (
          <span aria-hidden="true" className="size-4 animate-spin rounded-full border-2 border-current border-r-transparent" />
        ) : (
          <UploadIcon />
        )}
        Import CSV
        <input
          key={inputKey}
          id={id}
          type="file"
          accept=".csv,text/csv"
          className="sr-only"
          disabled={importItems.isPending}
          onChange={(event) => void onFile(event.target.files?.[0])}
        />
      </label>
      {outcome && (
        <div className="basis-full">
          {'result' in outcome ? (
            <Alert tone="success" title="The file is imported.">
              {countText(outcome.result.created, 'item added', 'items added')}, {countText(outcome.result.updated, 'item updated', 'items updated')}.
            </Alert>
          ) : (
            <Alert tone="error" title="Nothing was imported.">
              <p>{outcome.message}</p>
              {outcome.lines.length > 0 && (
                <ul className="mt-2 list-disc pl-5">
                  {outcome.lines.map((line) => (
                    <li key={line}>{line}</li>
                  ))}
                </ul>
              )}
              <p className="mt-2">Correct the file and import it again.</p>
            </Alert>
          )}
        </div>
      )}
    </>
  );
}
