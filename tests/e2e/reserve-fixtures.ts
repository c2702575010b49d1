import type { Page } from '@playwright/test';
import { expect } from './fixtures';

/** Whether the coming Saturday lies in next Monday-to-Sunday week of the shop: it does on a Saturday or a Sunday. */
export function comingSaturdayIsNextWeek(timeZone: string): boolean {
  const today = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long' }).format(new Date());
  return today === 'Saturday' || today === 'Sunday';
}

/** Opens Reserve, then the machine's week: this week, or the next one when `nextWeek`. */
export async function openMachineWeek(page: Page, machineName: string, nextWeek: boolean): Promise<void> {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Reserve' }).click();
  await page.getByRole('link', { name: new RegExp(machineName) }).click();
  await expect(page.getByRole('heading', { name: new RegExp(`^${machineName}: week of`) })).toBeVisible();
  if (nextWeek) await page.getByRole('button', { name: 'Next week' }).click();
}
