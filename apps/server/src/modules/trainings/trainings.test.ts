import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { trainingSchema } from '@chuckkey/core';
import { createMachine, createTraining } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const uniqueName = (prefix = 'Knurling') => `${prefix} ${randomUUID().slice(0, 8)}`;

function trainingBody(overrides: Record<string, unknown> = {}) {
  return {
    name: uniqueName(),
    description: 'Straight and diamond knurls on the engine lathe.',
    checklist: [
      { id: 'picks-the-knurl', label: 'Picks the knurl pitch for the stock' },
      { id: 'sets-the-speed', label: 'Sets a slow spindle speed and feeds with plenty of oil' },
    ],
    validityMonths: 24,
    ...overrides,
  };
}

describe('GET /api/trainings', () => {
  it('when signed out, answers 401 unauthenticated', async () => {
    const res = await request(ctx.app).get('/api/trainings');

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('for a member, lists every training as an array with its checklist, validity and the machines that require it', async () => {
    const machine = await createMachine(ctx.db);
    const training = await createTraining(ctx.db, { name: uniqueName('Parting off'), validity_months: 0, machine_ids: [machine.id] });
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/trainings');

    expect(res.status).toBe(200);
    expect(Array.isArray(res.body)).toBe(true);
    const listed = res.body.find((t: { id: string }) => t.id === training.id);
    expect(listed).toEqual({
      id: training.id,
      name: training.name,
      description: '',
      checklist: training.checklist,
      validityMonths: 0,
      active: true,
      machineIds: [machine.id],
    });
    expect(trainingSchema.safeParse(listed).success).toBe(true);
  });
});

describe('POST /api/trainings', () => {
  it('for an admin, creates the training and answers 201 with it', async () => {
    const admin = await signedIn(ctx, 'admin');
    const body = trainingBody();

    const res = await admin.post('/api/trainings', body);

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ...body, active: true, machineIds: [] });
    const row = await ctx.db('trainings').first('name', 'validity_months', 'checklist').where({ id: res.body.id });
    expect(row).toEqual({ name: body.name, validity_months: 24, checklist: body.checklist });
  });

  it('for a second training with the same name in another case, answers 409 training_name_taken', async () => {
    const admin = await signedIn(ctx, 'admin');
    const existing = await createTraining(ctx.db, { name: uniqueName('Tapping') });

    const res = await admin.post('/api/trainings', trainingBody({ name: `  ${existing.name.toUpperCase()} ` }));

    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('training_name_taken');
    expect(res.body.errors.name).toBeDefined();
  });

  it('with no checklist items, a negative validity and duplicate item ids, answers 400 naming each field', async () => {
    const admin = await signedIn(ctx, 'admin');

    const empty = await admin.post('/api/trainings', trainingBody({ checklist: [], validityMonths: -1, name: '' }));
    const duplicates = await admin.post('/api/trainings', trainingBody({ checklist: [{ id: 'same', label: 'One' }, { id: 'same', label: 'Two' }] }));
    const badId = await admin.post('/api/trainings', trainingBody({ checklist: [{ id: 'Not A Slug!', label: 'One' }] }));

    expect(empty.status).toBe(400);
    expect(empty.body.code).toBe('validation_failed');
    expect(Object.keys(empty.body.errors).sort()).toEqual(['checklist', 'name', 'validityMonths']);
    expect(duplicates.status).toBe(400);
    expect(duplicates.body.errors.checklist).toBeDefined();
    expect(badId.status).toBe(400);
    expect(badId.body.errors['checklist.0.id']).toBeDefined();
  });

  it('for an instructor or a member, answers 403 and creates nothing', async () => {
    const body = trainingBody();
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.post('/api/trainings', body);
      expect(res.status, role).toBe(403);
      expect(res.body.code).toBe('forbidden');
    }
    expect(await ctx.db('trainings').first('id').where({ name: body.name })).toBeUndefined();
  });

  it('when signed out, answers 401', async () => {
    const client = await browser(ctx);
    const res = await client.post('/api/trainings', trainingBody());
    expect(res.status).toBe(401);
  });
});

describe('PUT /api/trainings/:id', () => {
  it('for an admin, replaces the name, checklist, validity and active flag', async () => {
    const training = await createTraining(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    const body = trainingBody({ validityMonths: 6, active: false });

    const res = await admin.put(`/api/trainings/${training.id}`, body);

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: training.id, name: body.name, checklist: body.checklist, validityMonths: 6, active: false });
  });

  it('keeping its own name, is not a duplicate', async () => {
    const training = await createTraining(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.put(`/api/trainings/${training.id}`, trainingBody({ name: training.name }));

    expect(res.status).toBe(200);
    expect(res.body.name).toBe(training.name);
  });

  it('taking another training’s name, answers 409 training_name_taken and changes nothing', async () => {
    const first = await createTraining(ctx.db);
    const second = await createTraining(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.put(`/api/trainings/${second.id}`, trainingBody({ name: first.name }));

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('training_name_taken');
    expect((await ctx.db('trainings').first('name').where({ id: second.id })).name).toBe(second.name);
  });

  it('for an id nobody has, answers 404 training_not_found; for a bad id, 400 naming id', async () => {
    const admin = await signedIn(ctx, 'admin');

    const missing = await admin.put(`/api/trainings/${randomUUID()}`, trainingBody());
    const bad = await admin.put('/api/trainings/nope', trainingBody());

    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('training_not_found');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors)).toEqual(['id']);
  });

  it('for an instructor or a member, answers 403; signed out, 401; and changes nothing', async () => {
    const training = await createTraining(ctx.db);
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.put(`/api/trainings/${training.id}`, trainingBody());
      expect(res.status, role).toBe(403);
    }
    const anonymous = await (await browser(ctx)).put(`/api/trainings/${training.id}`, trainingBody());

    expect(anonymous.status).toBe(401);
    expect((await ctx.db('trainings').first('name').where({ id: training.id })).name).toBe(training.name);
  });
});
