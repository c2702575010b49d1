import { OVERDUE_CHECKOUT_BLOCK_DAYS_MAX, shopPoliciesSchema, type ShopPolicies } from '@chuckkey/core';
import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { CountField } from '../../../components/ui/text-field';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { splitServerErrors } from '../../../lib/form-errors';

/** On a phone in the shop, every control here is at least 48 px tall. */
const TOUCH = 'min-h-12!';

interface ShopPoliciesFormProps {
  policies: ShopPolicies;
  /** Saves the policies and answers them as the server kept them. */
  onSave: (input: ShopPolicies) => Promise<ShopPolicies>;
}

/**
 * The overdue-tool block: a switch, and the days a tool may be overdue before it counts. The
 * days stay in the field while the switch is off, so turning it on again starts from them.
 */
export function ShopPoliciesForm({ policies, onSave }: ShopPoliciesFormProps) {
  const [blocking, setBlocking] = useState(policies.overdueCheckoutBlockDays !== null);
  const [days, setDays] = useState(policies.overdueCheckoutBlockDays === null ? '' : String(policies.overdueCheckoutBlockDays));
  const [daysError, setDaysError] = useState<string | undefined>();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved, savedRef] = useFocusedNotice(false);
  const [pending, setPending] = useState(false);
  const daysRef = useRef<HTMLInputElement>(null);

  const showDaysError = (message: string) => {
    setDaysError(message);
    daysRef.current?.focus();
  };

  const onSubmit = async (event: FormEvent) => {
    event.preventDefault();
    setSaved(false);
    setFormError(null);
    setDaysError(undefined);
    const text = days.trim();
    // An empty or non-numeric field is sent to the schema as text, so it gets the schema's own words.
    const value = blocking ? (/^\d+$/.test(text) ? Number(text) : text) : null;
    const parsed = shopPoliciesSchema.safeParse({ overdueCheckoutBlockDays: value });
    if (!parsed.success) {
      showDaysError(parsed.error.issues[0]?.message ?? 'Give a whole number of days.');
      return;
    }
    setPending(true);
    try {
      const kept = await onSave(parsed.data);
      setBlocking(kept.overdueCheckoutBlockDays !== null);
      if (kept.overdueCheckoutBlockDays !== null) setDays(String(kept.overdueCheckoutBlockDays));
      setSaved(true);
    } catch (error) {
      const split = splitServerErrors(error, ['overdueCheckoutBlockDays'] as const);
      if (split.fields.overdueCheckoutBlockDays) showDaysError(split.fields.overdueCheckoutBlockDays);
      setFormError(split.message);
    } finally {
      setPending(false);
    }
  };

  return (
    <form noValidate onSubmit={(event) => void onSubmit(event)} aria-label="Shop policies" className="flex flex-col gap-5">
      {formError && <Alert tone="error">{formError}</Alert>}
      {saved && (
        <Alert ref={savedRef} tabIndex={-1} tone="success">
          Policies saved.
        </Alert>
      )}
      <fieldset className="flex min-w-0 flex-col gap-4">
        <legend className="mb-2 text-lg font-bold text-neutral-900">Overdue crib tools</legend>
        <p className="text-neutral-700">
          Off by default. When it is on, a member whose crib tool is overdue by more than the days below cannot start a session on any machine: the
          station names the tool and when it was due, and tells them to bring it back to the crib. It applies to instructors and admins as well, and
          lifts as soon as the tool is checked in. Reminder mails go out either way.
        </p>
        <CheckboxField
          role="switch"
          label="Block machine use when a crib tool is overdue"
          checked={blocking}
          onChange={(event) => {
            setBlocking(event.target.checked);
            setDaysError(undefined);
            setSaved(false);
          }}
          className={TOUCH}
        />
        {blocking && (
          <CountField
            ref={daysRef}
            label="Days overdue before machines refuse"
            hint={`0 blocks from the moment the tool is due; at most ${OVERDUE_CHECKOUT_BLOCK_DAYS_MAX}.`}
            value={days}
            onChange={(event) => {
              setDays(event.target.value);
              setSaved(false);
            }}
            error={daysError}
            className={`${TOUCH} w-full sm:w-32`}
          />
        )}
      </fieldset>
      <div>
        <Button type="submit" pending={pending} className={TOUCH}>
          Save policies
        </Button>
      </div>
    </form>
  );
}
