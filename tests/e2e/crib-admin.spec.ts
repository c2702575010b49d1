import { readFile } from 'node:fs/promises';
import { expectNoWcagViolations } from './axe';
import { expect, test as base } from './fixtures';

interface Made {
  /** An asset tag no other run has used; the items carrying the tags handed out go after the test. */
  assetTag: () => string;
}

// Torn down before createUser, whose admin the items' audit entries name.
const test = base.extend<{ made: Made }>({
  made: async ({ db, createUser: _createUser }, use) => {
    const tags: string[] = [];
    await use({
      assetTag: () => {
        const tag = `MIC-${Date.now() % 1_000_000}-${tags.length + 1}`;
        tags.push(tag);
        return tag;
      },
    });
    const ids = (await db('crib_items').whereIn('asset_tag', tags).pluck('id')) as string[];
    await db('audit_log').where({ entity: 'crib_item' }).whereIn('entity_id', ids).delete();
    await db('crib_items').whereIn('id', ids).delete();
  },
});

test.use({ locale: 'en-US' });

// A 1 × 1 PNG (ISO/IEC 15948 signature, IHDR, IDAT, IEND), small enough to write out here.
const ONE_PIXEL_PNG = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==';

test.describe('the crib inventory', () => {
  test('an admin adds a tool with a photo, finds it, prints its label, and exports and re-imports the inventory', async ({ page, db, signInAs, made }) => {
    const assetTag = made.assetTag();
    const name = `Outside micrometer 0–25 mm ${assetTag}`;
    await signInAs('admin');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Crib' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Crib inventory' })).toBeVisible();
    await expect(page.getByRole('navigation', { name: 'Crib' }).getByRole('link', { name: 'Inventory' })).toHaveAttribute('aria-current', 'page');

    await page.getByRole('button', { name: 'Add item' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add an item' });
    await dialog.getByLabel('Name').fill(name);
    await dialog.getByLabel('Asset tag').fill(assetTag);
    await dialog.getByLabel('Bin (optional)').fill('Drawer A2');
    await dialog.getByRole('button', { name: 'Add item' }).click();
    const added = page.getByRole('dialog', { name: `Edit ${name}` });
    await expect(added.getByRole('status')).toContainText(`${name} is added to the crib`);
    await added.getByLabel('Choose a photo').setInputFiles({ name: 'micrometer.png', mimeType: 'image/png', buffer: Buffer.from(ONE_PIXEL_PNG, 'base64') });
    await expect(added.getByRole('img', { name: 'The photo you chose, before it is uploaded' })).toBeVisible();
    await added.getByRole('button', { name: 'Upload photo' }).click();
    await expect(added.getByRole('status').filter({ hasText: 'The photo is saved.' })).toBeVisible();
    await expect(added.getByRole('img', { name: `Photo of ${name}` })).toBeVisible();
    await added.getByRole('button', { name: 'Close' }).click();

    await page.getByLabel('Search the crib').fill(assetTag);
    const row = page.getByRole('table', { name: 'Crib inventory' }).getByRole('row').filter({ hasText: assetTag });
    await expect(row).toHaveCount(1);
    await expect(row).toContainText(name);
    await expect(row).toContainText('Drawer A2');
    await expect(row).toContainText('Good');
    await expectNoWcagViolations(page);

    // A second tool with the same tag is refused under the asset tag field (409 asset_tag_taken).
    await page.getByRole('button', { name: 'Add item' }).click();
    await dialog.getByLabel('Name').fill('Another micrometer');
    await dialog.getByLabel('Asset tag').fill(assetTag);
    await dialog.getByRole('button', { name: 'Add item' }).click();
    await expect(dialog.getByLabel('Asset tag')).toHaveAttribute('aria-invalid', 'true');
    await expect(dialog).toContainText('Another tool already has that asset tag.');
    await dialog.getByRole('button', { name: 'Cancel' }).click();

    await row.getByRole('checkbox', { name: `Choose ${name} for a label sheet` }).check();
    await page.getByRole('link', { name: 'Print labels for 1 chosen tool' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Asset tag labels' })).toBeVisible();
    const sheet = page.getByRole('list', { name: 'Label sheet' });
    await expect(sheet.getByRole('listitem')).toHaveCount(1);
    await expect(sheet.getByRole('listitem')).toContainText(assetTag);
    await expect(sheet.getByRole('listitem')).toContainText(name);
    await expect(sheet.getByRole('img', { name: `QR code of asset tag ${assetTag}` })).toBeVisible();
    await expectNoWcagViolations(page);

    await page.getByRole('link', { name: 'Back to the inventory' }).click();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export CSV' }).click()]);
    expect(download.suggestedFilename()).toBe('crib-items.csv');
    const csvPath = await download.path();
    const csv = await readFile(csvPath, 'utf8');
    expect(csv).toContain(assetTag);

    const items = Number((await db('crib_items').count<{ n: string }[]>({ n: '*' }))[0]?.n);
    await page.getByLabel('Import CSV').setInputFiles(csvPath);
    const imported = page.getByRole('status').filter({ hasText: 'The file is imported.' });
    await expect(imported).toContainText(`0 items added, ${items === 1 ? '1 item updated' : `${items} items updated`}.`);
    expect(await db('crib_items').where({ asset_tag: assetTag }).first('name')).toEqual({ name });
  });
});
