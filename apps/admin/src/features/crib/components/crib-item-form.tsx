import { cribConditions, type CribItem, type CribItemInput } from '@chuckkey/core';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { ChoiceGroup, RadioOption } from '../../../components/ui/choice-group';
import { DialogActions } from '../../../components/ui/form-actions';
import { SelectField } from '../../../components/ui/select-field';
import { CountField, TextField } from '../../../components/ui/text-field';
import { useServerErrors } from '../../../hooks/use-server-errors';
import { useSaveCribItem } from '../api/save-crib-item';
import { conditionLabels } from '../utils/inventory';
import { itemFormFields, itemFormSchema, toDraft } from '../utils/item-form';

type FormInput = z.input<typeof itemFormSchema>;

interface CribItemFormProps {
  /** Absent to add a new item. */
  item?: CribItem | undefined;
  onSaved: (item: CribItem) => void;
  onCancel: () => void;
}

/** A kind first, then that kind's own fields: a tool is lent and comes back, a consumable is counted and charged. */
export function CribItemForm({ item, onSaved, onCancel }: CribItemFormProps) {
  const save = useSaveCribItem();
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormInput, unknown, CribItemInput>({ resolver: zodResolver(itemFormSchema), defaultValues: toDraft(item) });
  const { formError, setFormError, showServerError } = useServerErrors(setError, itemFormFields, {
    codeFields: { asset_tag_taken: 'assetTag', kind_has_checkouts: 'kind', tool_quantity: 'kind' },
  });
  const kind = useWatch({ control, name: 'kind' });

  const onSubmit = handleSubmit(async (input) => {
    setFormError(null);
    try {
      onSaved(await save.mutateAsync({ id: item?.id, item: input }));
    } catch (error) {
      showServerError(error);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <ChoiceGroup legend="Kind" error={errors.kind?.message}>
        <div className="grid grid-cols-1 gap-2 sm:grid-cols-2">
          <RadioOption label="Tool" description="Lent to one member at a time and due back." value="tool" {...register('kind')} />
          <RadioOption label="Consumable" description="Taken by count and charged per unit." value="consumable" {...register('kind')} />
        </div>
      </ChoiceGroup>
      <TextField label="Name" autoComplete="off" hint="As members would ask for it, e.g. Outside micrometer 0–25 mm." error={errors.name?.message} {...register('name')} />

      {kind === 'tool' ? (
        <>
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <TextField
              label="Asset tag"
              autoComplete="off"
              spellCheck={false}
              hint="The text of the tool's QR label; unique in the crib."
              error={errors.assetTag?.message}
              {...register('assetTag')}
            />
            <TextField label="Serial number (optional)" autoComplete="off" spellCheck={false} error={errors.serialNumber?.message} {...register('serialNumber')} />
          </div>
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <TextField label="Bin (optional)" autoComplete="off" hint="Where it lives in the crib, e.g. Drawer A2." error={errors.binLocation?.message} {...register('binLocation')} />
            <SelectField label="Condition" error={errors.condition?.message} {...register('condition')}>
              {cribConditions.map((condition) => (
                <option key={condition} value={condition}>
                  {conditionLabels[condition]}
                </option>
              ))}
            </SelectField>
          </div>
          <CountField
            label="Loan period in hours (optional)"
            hint="Leave it blank and the tool is due back at the shop's closing time on the day it goes out."
            error={errors.loanPeriodHours?.message}
            {...register('loanPeriodHours')}
          />
        </>
      ) : (
        <>
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <TextField label="Bin (optional)" autoComplete="off" hint="Where it lives in the crib, e.g. Shelf W1." error={errors.binLocation?.message} {...register('binLocation')} />
            <TextField label="Unit" autoComplete="off" hint="What one of it is: each, spool, box." error={errors.unit?.message} {...register('unit')} />
          </div>
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">
            <CountField label="In stock" hint="Units on the shelf now." error={errors.stock?.message} {...register('stock')} />
            <CountField
              label="Reorder level (optional)"
              hint="Order more when the stock gets down to this."
              error={errors.reorderLevel?.message}
              {...register('reorderLevel')}
            />
            <TextField label="Price per unit" inputMode="decimal" autoComplete="off" hint="Charged to the member, e.g. 4.50." error={errors.priceCents?.message} {...register('priceCents')} />
          </div>
        </>
      )}

      <CheckboxField
        label="In circulation"
        hint="Untick to keep it off the shelf: it cannot be checked out until ticked again."
        error={errors.inCirculation?.message}
        {...register('inCirculation')}
      />
      <DialogActions pending={save.isPending} onCancel={onCancel}>
        <Button type="submit" pending={save.isPending}>
          {item ? 'Save changes' : 'Add item'}
        </Button>
      </DialogActions>
    </form>
  );
}
