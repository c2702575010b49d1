import type { CribStationConsumable, CribStationItem } from '@chuckkey/core';
import { outToLine } from './due-text';

export type BasketLine =
  | { kind: 'tool'; itemId: string; name: string; assetTag: string; dueAt: string; problem: string | null }
  | { kind: 'consumable'; itemId: string; name: string; unit: string; stock: number; quantity: number; problem: string | null };

/** What adding a scanned tool did, for the line read out to the member. */
export type ToolAdded = 'added' | 'already_in_basket' | 'not_available';

/**
 * Adds a scanned tool once. A tool someone has, or one out of circulation, still gets its line
 * with the reason in words, so the member sees why it cannot go and can take it off.
 */
export function addTool(lines: readonly BasketLine[], item: CribStationItem, now: Date, timeZone: string): { lines: BasketLine[]; added: ToolAdded } {
  if (lines.some((line) => line.itemId === item.id)) return { lines: [...lines], added: 'already_in_basket' };
  const problem = item.openCheckout
    ? outToLine(item.openCheckout.memberFirstName, item.openCheckout.dueAt, now, timeZone)
    : item.available
      ? null
      : 'Out of circulation until an admin checks it. Hand it in at the desk.';
  const line: BasketLine = { kind: 'tool', itemId: item.id, name: item.name, assetTag: item.assetTag, dueAt: item.dueAt, problem };
  return { lines: [...lines, line], added: problem ? 'not_available' : 'added' };
}

/** Sets how many of a consumable to take, within its stock; none takes its line off. */
export function setConsumable(lines: readonly BasketLine[], item: CribStationConsumable, quantity: number): BasketLine[] {
  const count = Math.min(Math.max(0, Math.floor(quantity)), item.stock);
  const rest = lines.filter((line) => line.itemId !== item.id);
  if (count === 0) return rest;
  const line: BasketLine = { kind: 'consumable', itemId: item.id, name: item.name, unit: item.unit, stock: item.stock, quantity: count, problem: null };
  const at = lines.findIndex((existing) => existing.itemId === item.id);
  if (at < 0) return [...rest, line];
  return [...rest.slice(0, at), line, ...rest.slice(at)];
}

export function quantityOf(lines: readonly BasketLine[], itemId: string): number {
  const line = lines.find((existing) => existing.itemId === itemId);
  return line?.kind === 'consumable' ? line.quantity : 0;
}

export function removeLine(lines: readonly BasketLine[], itemId: string): BasketLine[] {
  return lines.filter((line) => line.itemId !== itemId);
}

/** Marks the line the server refused, in words, until the member changes or removes it. */
export function markLine(lines: readonly BasketLine[], itemId: string, problem: string): BasketLine[] {
  return lines.map((line) => (line.itemId === itemId ? { ...line, problem } : line));
}

/** The basket can go when it holds something and no line carries a reason it cannot. */
export function canConfirm(lines: readonly BasketLine[]): boolean {
  return lines.length > 0 && lines.every((line) => line.problem === null);
}

export function basketRequest(lines: readonly BasketLine[]): { itemId: string; quantity: number }[] {
  return lines.map((line) => ({ itemId: line.itemId, quantity: line.kind === 'tool' ? 1 : line.quantity }));
}
