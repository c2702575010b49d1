import type { TagOutListItem, User } from '@chuckkey/core';
import { useId, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { ActionsTh, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { formatDateTime } from '../../../lib/format';
import { useTagOuts } from '../api/get-tag-outs';
import { mayClear } from '../utils/may-clear';
import { ClearTagOutDialog } from './clear-tag-out-dialog';

const personName = (person: TagOutListItem['reportedBy']) => (person ? `${person.firstName} ${person.lastName}`.trim() : 'A former member');


function OpenTagOuts({ user, timeZone }: { user: User; timeZone: string | undefined }) {
  const open = useTagOuts(true);
  const [clearing, setClearing] = useState<TagOutListItem | null>(null);
  const [cleared, setCleared] = useState<string | null>(null);

  if (open.isPending) return <Spinner label="Loading the open tag-outs…" />;
  if (open.isError) return <QueryError error={open.error} what="the open tag-outs" onRetry={() => void open.refetch()} retrying={open.isFetching} />;

  return (
    <>
      {cleared && <Alert tone="success">The {cleared} is back in service.</Alert>}
      {open.data.items.length === 0 ? (
        <EmptyState title="No machine is tagged out">
          When someone reports a problem, at a station or on the Shop floor, the machine appears here until it is cleared.
        </EmptyState>
      ) : (
        <Table caption="Open tag-outs">
          <THead>
            <Tr>
              <Th>Machine</Th>
              <Th>Reason</Th>
              <Th>Reported by</Th>
              <Th>Since</Th>
              <ActionsTh />
            </Tr>
          </THead>
          <TBody>
            {open.data.items.map((tagOut) => (
              <Tr key={tagOut.id}>
                <Td className="font-bold">{tagOut.machineName}</Td>
                <Td className="min-w-64">{tagOut.reason}</Td>
                <Td>{personName(tagOut.reportedBy)}</Td>
                <Td className="whitespace-nowrap">{formatDateTime(tagOut.reportedAt, timeZone)}</Td>
                <Td className="text-right">
                  {mayClear(user, tagOut) && (
                    <Button
                      variant="secondary"
                      aria-label={`Clear the tag-out of the ${tagOut.machineName}`}
                      onClick={() => {
                        setCleared(null);
                        setClearing(tagOut);
                      }}
                    >
                      Clear
                    </Button>
                  )}
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
      <ClearTagOutDialog
        tagOut={clearing}
        onClose={() => setClearing(null)}
        onCleared={() => {
          setCleared(clearing?.machineName ?? null);
          setClearing(null);
        }}
      />
    </>
  );
}

function ClearedTagOuts({ timeZone }: { timeZone: string | undefined }) {
  const history = useTagOuts(false);
  if (history.isPending) return <Spinner label="Loading the history…" />;
  if (history.isError) return <QueryError error={history.error} what="the cleared tag-outs" onRetry={() => void history.refetch()} retrying={history.isFetching} />;
  if (history.data.items.length === 0) return <p className="text-neutral-700">No tag-out has been cleared yet.</p>;
  return (
    <Table caption="Cleared tag-outs">
      <THead>
        <Tr>
          <Th>Machine</Th>
          <Th>Reason</Th>
          <Th>Reported</Th>
          <Th>Cleared</Th>
          <Th>What was done</Th>
        </Tr>
      </THead>
      <TBody>
        {history.data.items.map((tagOut) => (
          <Tr key={tagOut.id}>
            <Td className="font-bold">{tagOut.machineName}</Td>
            <Td className="min-w-48">{tagOut.reason}</Td>
            <Td>
              <span className="flex flex-col">
                <span>{personName(tagOut.reportedBy)}</span>
                <span className="text-sm whitespace-nowrap text-neutral-700">{formatDateTime(tagOut.reportedAt, timeZone)}</span>
              </span>
            </Td>
            <Td>
              <span className="flex flex-col">
                <span>{personName(tagOut.clearedBy)}</span>
                {tagOut.clearedAt && <span className="text-sm whitespace-nowrap text-neutral-700">{formatDateTime(tagOut.clearedAt, timeZone)}</span>}
              </span>
            </Td>
            <Td className="min-w-48">{tagOut.clearNote}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}

/** Open tag-outs first, the machines out of service now; the cleared ones below, latest first. */
export function TagOutTables({ user, timeZone }: { user: User; timeZone: string | undefined }) {
  const openId = useId();
  const historyId = useId();
  return (
    <div className="flex flex-col gap-10">
      <section aria-labelledby={openId} className="flex flex-col gap-4">
        <h2 id={openId} className="text-xl font-bold text-neutral-900">
          Out of service now
        </h2>
        <OpenTagOuts user={user} timeZone={timeZone} />
      </section>
      <section aria-labelledby={historyId} className="flex flex-col gap-4">
        <h2 id={historyId} className="text-xl font-bold text-neutral-900">
          History
        </h2>
        <ClearedTagOuts timeZone={timeZone} />
      </section>
    </div>
  );
}
