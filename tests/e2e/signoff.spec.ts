import { createMachine, createSignOff, createTraining, type MachineRow, type TrainingRow } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, test as base } from './fixtures';

interface Made {
  /** A training with a three-item practical checklist, required by a machine of its own. */
  training: () => Promise<{ training: TrainingRow; machine: MachineRow }>;
}

// The rows a test makes besides people; the people, their sign-offs and audit entries go with
// the createUser fixture, which is torn down after this one.
const test = base.extend<{ made: Made }>({
  made: async ({ db, createUser: _createUser }, use) => {
    const trainings: string[] = [];
    const machines: MachineRow[] = [];
    await use({
      training: async () => {
        const suffix = Date.now() % 1_000_000;
        const machine = await createMachine(db, { name: `Lathe T${suffix}`, category: 'lathe' });
        const training = await createTraining(db, {
          name: `Metal lathe fundamentals ${suffix}`,
          validity_months: 12,
          machine_ids: [machine.id],
          checklist: [
            { id: 'removes-the-chuck-key', label: 'Removes the chuck key before starting the spindle' },
            { id: 'sets-speed-for-diameter', label: 'Sets the spindle speed for the diameter of the work' },
            { id: 'stops-before-measuring', label: 'Stops the spindle before measuring' },
          ],
        });
        machines.push(machine);
        trainings.push(training.id);
        return { training, machine };
      },
    });
    await db('sign_offs').whereIn('training_id', trainings).delete();
    await db('machines')
      .whereIn(
        'id',
        machines.map((machine) => machine.id),
      )
      .delete();
    await db('areas')
      .whereIn(
        'id',
        machines.map((machine) => machine.area_id),
      )
      .delete();
    await db('trainings').whereIn('id', trainings).delete();
  },
});

// Dates are compared as the page writes them: US English, in the shop's time zone.
test.use({ locale: 'en-US' });

function calendarDate(instant: Date, timeZone: string) {
  const parts = new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric', month: 'numeric', day: 'numeric' }).formatToParts(instant);
  const part = (type: 'year' | 'month' | 'day') => Number(parts.find((p) => p.type === type)?.value);
  return { year: part('year'), month: part('month'), day: part('day') };
}

test.describe('signing a member off in the web app', () => {
  test('an instructor signs a member off after ticking every checklist item, and the member sees it on My record', async ({
    page,
    browser,
    db,
    shop,
    createUser,
    signInAs,
    made,
  }) => {
    const { training, machine } = await made.training();
    const suffix = Date.now() % 1_000_000;
    const member = await createUser({ first_name: 'Wren', last_name: `Alder${suffix}` });
    const memberName = `Wren Alder${suffix}`;
    const instructor = await signInAs('instructor');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Teach' }).click();
    await page.getByLabel('Find the member').fill(`Alder${suffix}`);
    await page.getByRole('button', { name: `Choose ${memberName}` }).click();
    await expect(page.getByText('Signing off')).toBeVisible();
    await page.getByRole('combobox', { name: 'Training' }).selectOption({ label: training.name });

    const confirm = page.getByRole('button', { name: 'Confirm sign-off' });
    for (const item of training.checklist) {
      await expect(confirm).toBeDisabled();
      await page.getByRole('checkbox', { name: item.label }).check();
    }
    await expect(confirm).toBeEnabled();
    await page.getByRole('radio', { name: /^Independent/ }).check();
    await page.getByLabel('Note (optional)').fill('Faced and turned a bar to size; kept the chuck key in hand.');
    await expect(page.getByText(/^Valid until .+ \(12 months from today\)$/)).toBeVisible();
    await confirm.click();

    const done = page.getByRole('status').filter({ hasText: 'Signed off' });
    await expect(done).toContainText(memberName);
    await expect(done).toContainText(training.name);

    const row = await db('sign_offs').first('*').where({ member_id: member.id, training_id: training.id });
    expect(row).toMatchObject({ signed_by: instructor.id, signed_via: 'web', level: 'independent' });
    expect((row.checklist as { seen: boolean }[]).every((item) => item.seen)).toBe(true);

    // A 12-month sign-off counts through the same calendar day a year later, in the shop's time
    // zone (product rule; 29 February clamps to 28 February).
    const expiresAt = row.expires_at as Date;
    const signed = calendarDate(row.signed_at as Date, shop.timeZone);
    const lastDay = calendarDate(new Date(expiresAt.getTime() - 1), shop.timeZone);
    const daysInMonth = new Date(Date.UTC(signed.year + 1, signed.month, 0)).getUTCDate();
    expect(lastDay).toEqual({ year: signed.year + 1, month: signed.month, day: Math.min(signed.day, daysInMonth) });
    const validUntil = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone: shop.timeZone }).format(
      new Date(expiresAt.getTime() - 1),
    );
    await expect(done).toContainText(`valid until ${validUntil}`);

    const memberContext = await browser.newContext({ locale: 'en-US' });
    try {
      const memberPage = await memberContext.newPage();
      await signIn(memberPage, member.email, member.password);
      await memberPage.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My record' }).click();

      const card = memberPage.getByRole('list', { name: 'My sign-offs' }).getByRole('article', { name: training.name });
      await expect(card.getByText('Valid', { exact: true })).toBeVisible();
      await expect(card).toContainText(new RegExp(`Valid until\\s*${validUntil.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
      await expect(card).toContainText('Independent');
      await expect(card).toContainText(machine.name);
      await expect(card).toContainText(instructor.first_name);
    } finally {
      await memberContext.close();
    }
  });

  test('a member cannot open Teach, and the API refuses to let them sign anyone off', async ({ page, db, createUser, signInAs, made }) => {
    const { training } = await made.training();
    const other = await createUser();
    await signInAs('member');

    await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Teach' })).toHaveCount(0);
    await page.goto('/teach');
    await expect(page.getByRole('heading', { name: /don['’]t have access to Teach/ })).toBeVisible();
    await expect(page.getByRole('form', { name: 'Sign off a member' })).toHaveCount(0);

    const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
    const attempt = await page.request.post('/api/sign-offs', {
      headers: { 'x-csrf-token': token },
      data: { memberId: other.id, trainingId: training.id, level: 'independent', checklist: training.checklist.map((item) => item.id), note: '' },
    });
    expect(attempt.status()).toBe(403);
    expect((await page.request.get('/api/teach/members?search=wren')).status()).toBe(403);
    expect(await db('sign_offs').where({ member_id: other.id })).toHaveLength(0);
  });

  test('My record and the sign-off form pass the automatic WCAG 2.2 AA checks', async ({ page, browser, db, createUser, signInAs, made }) => {
    const { training } = await made.training();
    const suffix = Date.now() % 1_000_000;
    const teacher = await createUser({ role: 'instructor' });
    const member = await createUser({ first_name: 'Ada', last_name: `Quill${suffix}` });
    await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: teacher.id, level: 'supervised' });

    const memberContext = await browser.newContext({ locale: 'en-US' });
    try {
      const memberPage = await memberContext.newPage();
      await signIn(memberPage, member.email, member.password);
      await memberPage.goto('/my-record');
      await expect(memberPage.getByRole('article', { name: training.name })).toBeVisible();
      await expect(memberPage.getByRole('img', { name: /QR code of your badge/ })).toBeVisible();
      // WCAG 2.2 level A and AA, as far as axe-core checks them automatically (tags wcag2a, wcag2aa, wcag21aa, wcag22aa).
      await expectNoWcagViolations(memberPage);
    } finally {
      await memberContext.close();
    }

    await signInAs('instructor');
    await page.goto('/teach');
    await page.getByLabel('Find the member').fill(`Quill${suffix}`);
    await page.getByRole('button', { name: `Choose Ada Quill${suffix}` }).click();
    await page.getByRole('combobox', { name: 'Training' }).selectOption({ label: training.name });
    await expect(page.getByRole('checkbox', { name: training.checklist[0]?.label ?? '' })).toBeVisible();
    // WCAG 2.2 level A and AA via axe-core, with the checklist and the level choice on screen.
    await expectNoWcagViolations(page);
  });
});
