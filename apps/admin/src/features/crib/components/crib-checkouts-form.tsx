import { cribCheckoutInputSchema, type CribCheckout, type CribCheckoutInput, type CribItem } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import type { ComponentType, Ref } from 'react';
import { useForm, useWatch, type DefaultValues } from 'react-hook-form';
import type { z } from 'zod';
import { ChosenMember } from '../../../components/chosen-member';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { QueryError } from '../../../components/ui/query-error';
import { SelectField } from '../../../components/ui/select-field';
import { Spinner } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { useFocusedNotice } from '../../../hooks/use-focused-notice';
import { useMemberChoice } from '../../../hooks/use-member-choice';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { formatDateTime } from '../../../lib/format';
import { useCheckOut } from '../api/check-out';
import { useCheckoutItems } from '../api/checkout-items';

export interface CheckoutMember {
  id: string;
  name: string;
  email: string;
}

const fields = ['memberId', 'itemId', 'quantity'] as const;

export const checkoutErrorMessages: Record<string, string> = {
  already_out: 'This tool is already out to someone. It has to be returned before it can be lent again.',
  short_stock: 'There is not that much of it in stock. Nothing was taken; choose a smaller count.',
  out_of_circulation: 'This item is out of circulation (waiting for a repair or a check), so it cannot be lent. Put it back in circulation first.',
  member_not_found: 'That member is no longer in the shop’s records. Search again.',
  member_inactive: 'That member’s account is not active, so nothing can be lent to them.',
  crib_item_not_found: 'That item is no longer in the crib. Choose another.',
  tool_quantity: 'A tool is lent one at a time.',
};

const errorOptions = {
  codeFields: {
    member_not_found: 'memberId' as const,
    member_inactive: 'memberId' as const,
    crib_item_not_found: 'itemId' as const,
    already_out: 'itemId' as const,
    out_of_circulation: 'itemId' as const,
    short_stock: 'quantity' as const,
    tool_quantity: 'quantity' as const,
  },
  messages: checkoutErrorMessages,
};

type FormInput = z.input<typeof cribCheckoutInputSchema>;
const emptyForm: DefaultValues<FormInput> = { memberId: '', itemId: '', quantity: 1 };

function itemLabel(item: CribItem): string {
  if (item.kind === 'tool') return [item.name, item.assetTag, item.binLocation ? `bin ${item.binLocation}` : null].filter(Boolean).join(' · ');
  return `${item.name} · ${item.stock ?? 0} ${item.unit ?? ''} in stock`.trim();
}

function doneWords(checkout: CribCheckout, timeZone: string | undefined): string {
  if (checkout.itemKind === 'consumable') return `${checkout.memberName} took ${checkout.quantity} of ${checkout.itemName}.`;
  return `${checkout.itemName} is out to ${checkout.memberName}, due back ${checkout.dueAt ? formatDateTime(checkout.dueAt, timeZone) : 'with no due time'}.`;
}

export interface CheckoutMemberSearchProps {
  onChoose: (member: CheckoutMember) => void;
  error: string | undefined;
  /** The search box, focused again when the chosen member is cleared. */
  inputRef: Ref<HTMLInputElement>;
}

interface CribCheckoutsFormProps {
  timeZone: string | undefined;
  /** Finds the member and hands the one picked to `onChoose`. */
  MemberSearch: ComponentType<CheckoutMemberSearchProps>;
}

/** An admin lends a tool or hands out a consumable for a member at the counter. */
export function CribCheckoutsForm({ timeZone, MemberSearch }: CribCheckoutsFormProps) {
  const items = useCheckoutItems();
  const checkOut = useCheckOut();
  const [done, setDone, doneRef] = useFocusedNotice<CribCheckout | null>(null);

  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    reset,
    formState: { errors, isSubmitted },
  } = useForm<FormInput, unknown, CribCheckoutInput>({ resolver: zodResolver(cribCheckoutInputSchema), defaultValues: emptyForm });
  const { formError, setFormError, showServerError } = useServerErrors(setError, fields, errorOptions);
  const { member, choose, chosenRef, searchRef } = useMemberChoice<CheckoutMember>((next) =>
    setValue('memberId', next?.id ?? '', { shouldValidate: isSubmitted }),
  );

  const itemId = useWatch({ control, name: 'itemId' });
  const available = (items.data ?? []).filter((item) => item.available);
  const tools = available.filter((item) => item.kind === 'tool');
  const consumables = available.filter((item) => item.kind === 'consumable');
  const chosenItem = available.find((item) => item.id === itemId);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setDone(null);
    try {
      // A tool is lent one at a time whatever the count box last said.
      const checkout = await checkOut.mutateAsync({ ...values, quantity: chosenItem?.kind === 'consumable' ? values.quantity : 1 });
      reset({ ...emptyForm, memberId: values.memberId });
      setDone(checkout);
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <div className="flex flex-col gap-5">
      {done && (
        <Alert ref={doneRef} tabIndex={-1} tone="success" title={done.itemKind === 'tool' ? 'Checked out' : 'Taken'}>
          {doneWords(done, timeZone)}
        </Alert>
      )}
      <form noValidate onSubmit={onSubmit} aria-label="Check out from the crib" className="flex flex-col gap-5">
        {formError && <Alert tone="error">{formError}</Alert>}
        <input type="hidden" {...register('memberId')} />

        <section className="flex flex-col gap-3">
          <h3 className="text-lg font-bold text-neutral-900">1. Member</h3>
          {member ? (
            <ChosenMember
              member={member}
              caption="Checking out to"
              cardRef={chosenRef}
              error={errors.memberId?.message}
              errorId="crib-checkout-member-error"
              onChange={() => choose(null)}
            />
          ) : (
            <MemberSearch onChoose={choose} error={errors.memberId?.message} inputRef={searchRef} />
          )}
        </section>

        <section className="flex flex-col gap-3">
          <h3 className="text-lg font-bold text-neutral-900">2. Item</h3>
          {items.isPending ? (
            <Spinner label="Loading the crib’s items…" />
          ) : items.isError ? (
            <QueryError error={items.error} what="the crib’s items" onRetry={() => void items.refetch()} retrying={items.isFetching} />
          ) : available.length === 0 ? (
            <p className="text-neutral-800">Nothing in the crib can be checked out now: every tool is out or out of circulation, and no consumable is in stock.</p>
          ) : (
            <>
              <SelectField
                label="Item"
                hint="Only what is on the shelf: tools not out and in circulation, consumables in stock."
                error={errors.itemId?.message}
                {...register('itemId', { onChange: () => setValue('quantity', 1) })}
              >
                <option value="">Choose an item</option>
                {tools.length > 0 && (
                  <optgroup label="Tools">
                    {tools.map((item) => (
                      <option key={item.id} value={item.id}>
                        {itemLabel(item)}
                      </option>
                    ))}
                  </optgroup>
                )}
                {consumables.length > 0 && (
                  <optgroup label="Consumables">
                    {consumables.map((item) => (
                      <option key={item.id} value={item.id}>
                        {itemLabel(item)}
                      </option>
                    ))}
                  </optgroup>
                )}
              </SelectField>
              {chosenItem?.kind === 'consumable' ? (
                <TextField
                  label={`How many (${chosenItem.unit ?? 'each'})`}
                  hint={`${chosenItem.stock ?? 0} in stock. Consumables are not returned; they are added to the member’s charges.`}
                  type="number"
                  inputMode="numeric"
                  min={1}
                  max={chosenItem.stock ?? undefined}
                  error={errors.quantity?.message}
                  containerClassName="flex max-w-48 flex-col gap-1.5"
                  {...register('quantity', { valueAsNumber: true })}
                />
              ) : (
                chosenItem && (
                  <p className="text-neutral-800">
                    {chosenItem.loanPeriodHours
                      ? `Due back ${chosenItem.loanPeriodHours} h after checking out.`
                      : 'Due back at the shop’s closing time today.'}{' '}
                    The due time is confirmed once it is checked out.
                  </p>
                )
              )}
            </>
          )}
        </section>

        <div>
          <Button type="submit" pending={checkOut.isPending}>
            Check out
          </Button>
        </div>
      </form>
    </div>
  );
}
