import { useEffect, useId, useRef } from 'react';
import { checklistItemSchema } from '@chuckkey/core';
import type { FieldErrors } from 'react-hook-form';
import { moveItem, newDraftKey, type ChecklistDraftItem } from '../lib/checklist';
import { Button } from './ui/button';
import { cn } from './ui/cn';
import { FieldError, controlClasses } from './ui/field';
import { ArrowDownIcon, ArrowUpIcon, PlusIcon, TrashIcon } from './ui/icons';

const LABEL_MAX = checklistItemSchema.shape.label.maxLength ?? 200;

interface ChecklistEditorProps {
  legend: string;
  hint: string;
  items: ChecklistDraftItem[];
  onChange: (items: ChecklistDraftItem[]) => void;
  /** The message for the whole list (too few items), and per item, by position. */
  error?: string | undefined;
  itemErrors?: (string | undefined)[];
  addLabel?: string;
}

/** A checklist field's errors as react-hook-form keeps them: for the whole list, or per item. */
export type ChecklistFieldErrors = FieldErrors<{ items: ChecklistDraftItem[] }>['items'];

/** Puts a checklist field's errors where the editor shows them: under the list, or under an item. */
export function checklistErrorProps(errors: ChecklistFieldErrors): Pick<ChecklistEditorProps, 'error' | 'itemErrors'> {
  return {
    error: errors?.message ?? errors?.root?.message,
    itemErrors: Array.isArray(errors) ? errors.map((item) => item?.label?.message) : [],
  };
}

type Focus = { key: string; control: 'label' | 'up' | 'down' } | { key: null; control: 'add' };

/**
 * Items are added, reworded, removed and put in order with buttons only, no dragging, so that
 * a keyboard or a screen reader does all of it; focus follows the item that moved.
 */
export function ChecklistEditor({ legend, hint, items, onChange, error, itemErrors = [], addLabel = 'Add an item' }: ChecklistEditorProps) {
  const baseId = useId();
  const hintId = `${baseId}-hint`;
  const errorId = `${baseId}-error`;
  const pendingFocus = useRef<Focus | null>(null);
  const idOf = (key: string, control: string) => `${baseId}-${key}-${control}`;

  useEffect(() => {
    const focus = pendingFocus.current;
    if (!focus) return;
    pendingFocus.current = null;
    const target = focus.key === null ? document.getElementById(`${baseId}-add`) : document.getElementById(idOf(focus.key, focus.control));
    target?.focus();
  });

  function move(index: number, by: -1 | 1) {
    const item = items[index];
    if (!item) return;
    const target = index + by;
    // At either end the button just pressed turns disabled; the other one keeps focus.
    const control = by === -1 ? (target === 0 ? 'down' : 'up') : target === items.length - 1 ? 'up' : 'down';
    pendingFocus.current = { key: item.key, control };
    onChange(moveItem(items, index, by));
  }

  function remove(index: number) {
    const next = items.filter((_, i) => i !== index);
    const neighbour = next[index] ?? next[index - 1];
    pendingFocus.current = neighbour ? { key: neighbour.key, control: 'label' } : { key: null, control: 'add' };
    onChange(next);
  }

  function add() {
    const item = { key: newDraftKey(), id: '', label: '' };
    pendingFocus.current = { key: item.key, control: 'label' };
    onChange([...items, item]);
  }

  const described = [hintId, error ? errorId : null].filter(Boolean).join(' ');

  return (
    <fieldset aria-describedby={described} className="flex min-w-0 flex-col gap-3">
      <legend className="mb-1.5 font-bold text-neutral-900">{legend}</legend>
      <p id={hintId} className="-mt-1 text-sm text-neutral-700">
        {hint}
      </p>
      {items.length > 0 && (
        <ol className="flex flex-col gap-3">
          {items.map((item, index) => {
            const number = index + 1;
            const itemError = itemErrors[index];
            const inputId = idOf(item.key, 'label');
            return (
              <li key={item.key} className="flex flex-col gap-1.5 rounded-md border border-neutral-300 bg-neutral-50 p-3">
                <label htmlFor={inputId} className="font-bold text-neutral-900">
                  Item {number}
                </label>
                <input
                  id={inputId}
                  value={item.label}
                  maxLength={LABEL_MAX}
                  aria-invalid={itemError ? true : undefined}
                  aria-describedby={itemError ? `${inputId}-error` : undefined}
                  onChange={(event) => onChange(items.map((other) => (other.key === item.key ? { ...other, label: event.target.value } : other)))}
                  className={controlClasses}
                />
                {itemError && <FieldError id={`${inputId}-error`}>{itemError}</FieldError>}
                <div className="flex flex-wrap gap-2">
                  <Button id={idOf(item.key, 'up')} variant="secondary" onClick={() => move(index, -1)} disabled={index === 0} className="px-3">
                    <ArrowUpIcon />
                    <span>
                      <span className="sr-only">Move item {number} </span>Up
                    </span>
                  </Button>
                  <Button
                    id={idOf(item.key, 'down')}
                    variant="secondary"
                    onClick={() => move(index, 1)}
                    disabled={index === items.length - 1}
                    className="px-3"
                  >
                    <ArrowDownIcon />
                    <span>
                      <span className="sr-only">Move item {number} </span>Down
                    </span>
                  </Button>
                  <Button variant="secondary" onClick={() => remove(index)} className={cn('px-3', 'sm:ml-auto')}>
                    <TrashIcon />
                    <span>
                      Remove<span className="sr-only"> item {number}</span>
                    </span>
                  </Button>
                </div>
              </li>
            );
          })}
        </ol>
      )}
      {error && <FieldError id={errorId}>{error}</FieldError>}
      <div>
        <Button id={`${baseId}-add`} variant="secondary" onClick={add}>
          <PlusIcon />
          {addLabel}
        </Button>
      </div>
    </fieldset>
  );
}
