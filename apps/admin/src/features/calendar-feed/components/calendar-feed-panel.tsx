import type { CalendarFeedStatus } from '@chuckkey/core';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Panel } from '../../../components/ui/panel';
import { errorMessage } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { createCalendarFeed, revokeCalendarFeed } from '../api/calendar-feed';

const REVOKE_WORDS = { calendar_feed_not_found: 'You have no calendar feed to turn off.' };

interface CalendarFeedPanelProps {
  /** What the server knows of the member's feed; undefined while it is being asked. */
  status: CalendarFeedStatus | undefined;
  timeZone?: string | undefined;
  onCreate?: () => Promise<string>;
  onRevoke?: () => Promise<void>;
  /** After a new link or turning it off, so the status is asked again. */
  onChanged?: () => Promise<unknown>;
}

/**
 * The member's private calendar feed. The server keeps only a hash of the address, so it can be
 * shown once, right after it is made; after a reload the panel can say only that a link is live
 * and since when, and making a new one is how a lost address is replaced.
 */
export function CalendarFeedPanel({ status, timeZone, onCreate = createCalendarFeed, onRevoke = revokeCalendarFeed, onChanged }: CalendarFeedPanelProps) {
  const [url, setUrl] = useState<string | null>(null);
  const [creating, setCreating] = useState(false);
  const [createError, setCreateError] = useState<string | null>(null);
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [revoking, setRevoking] = useState(false);
  const [revokeError, setRevokeError] = useState<string | null>(null);
  const [revoked, setRevoked] = useState(false);

  async function create() {
    setCreating(true);
    setCreateError(null);
    setCopied(null);
    setRevoked(false);
    try {
      setUrl(await onCreate());
      await onChanged?.();
    } catch (error) {
      setCreateError(errorMessage(error));
    } finally {
      setCreating(false);
    }
  }

  async function copy(text: string) {
    try {
      await navigator.clipboard.writeText(text);
      setCopied('yes');
    } catch {
      setCopied('failed');
    }
  }

  async function revoke() {
    setRevoking(true);
    setRevokeError(null);
    try {
      await onRevoke();
      setConfirming(false);
      setUrl(null);
      setRevoked(true);
      await onChanged?.();
    } catch (error) {
      setRevokeError(errorMessage(error, REVOKE_WORDS));
    } finally {
      setRevoking(false);
    }
  }

  // Until the status answers again after turning it off, the earlier answer would still say "live".
  const live = url !== null || (!revoked && (status?.exists ?? false));
  const liveSince = !url && live && status?.createdAt ? status.createdAt : null;

  return (
    <Panel
      title="Calendar feed"
      description="A private address your calendar app can subscribe to, so your reservations show up there and stay up to date."
    >
      <div className="flex flex-col gap-4">
        {createError && <Alert tone="error">{createError}</Alert>}
        {revoked && (
          <Alert tone="success" title="Calendar feed turned off">
            The old address no longer shows your reservations. Make a new one whenever you like.
          </Alert>
        )}
        {url && (
          <div className="flex flex-col gap-2">
            <label htmlFor="calendar-feed-url" className="font-bold text-neutral-900">
              Your feed address
            </label>
            <input
              id="calendar-feed-url"
              readOnly
              value={url}
              onFocus={(event) => event.currentTarget.select()}
              className="min-h-11 w-full rounded-md border border-neutral-400 bg-neutral-50 px-3 font-mono text-sm text-neutral-900"
            />
            <p className="text-sm text-neutral-800">
              Anyone with this link can see your reservations. It is shown only now: copy it into your calendar app, and
              make a new one if it gets out.
            </p>
            <div className="flex flex-wrap items-center gap-3">
              <Button variant="secondary" onClick={() => void copy(url)}>
                Copy address
              </Button>
              <span role="status" className="text-sm text-neutral-800">
                {copied === 'yes' ? 'Copied.' : copied === 'failed' ? 'Could not copy: select the address and copy it by hand.' : ''}
              </span>
            </div>
          </div>
        )}
        {liveSince && (
          <p className="text-neutral-900">
            Your calendar feed link has been live since {formatDateTime(liveSince, timeZone)}. Its address was shown only once, when it was
            made: if you no longer have it, make a new link.
          </p>
        )}
        {status === undefined && !url && <p className="text-neutral-700">Checking whether you have a calendar feed…</p>}
        <div className="flex flex-wrap gap-3">
          <Button onClick={() => void create()} pending={creating}>
            {live ? 'Make a new link' : 'Make a feed link'}
          </Button>
          {live && (
            <Button
              variant="secondary"
              onClick={() => {
                setRevokeError(null);
                setConfirming(true);
              }}
            >
              Turn off calendar feed
            </Button>
          )}
        </div>
        <p className="text-sm text-neutral-700">Making a new link stops the old one from working.</p>
      </div>
      <ConfirmDialog
        open={confirming}
        title="Turn off your calendar feed?"
        confirmLabel="Turn off feed"
        confirmVariant="danger"
        pending={revoking}
        error={revokeError}
        onCancel={() => setConfirming(false)}
        onConfirm={() => void revoke()}
      >
        The address stops working at once: calendars subscribed to it no longer get your reservations.
      </ConfirmDialog>
    </Panel>
  );
}
