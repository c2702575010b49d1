import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { machineDetailSchema, machineListSchema } from '@chuckkey/core';
import { createArea, createMachine, createTraining } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const suffix = () => randomUUID().slice(0, 8);

const latheChecklist = [
  { id: 'eye-protection', label: 'Safety glasses on' },
  { id: 'chuck-key-removed', label: 'Chuck key out of the chuck' },
];

async function machineBody(overrides: Record<string, unknown> = {}) {
  const area = await createArea(ctx.db);
  return {
    name: `Lathe ${suffix()}`,
    category: 'lathe',
    areaId: area.id,
    reservable: true,
    description: 'Gap-bed engine lathe.',
    requiresPin: false,
    safetyChecklist: latheChecklist,
    trainingIds: [] as string[],
    ...overrides,
  };
}

describe('GET /api/machines', () => {
  it('when signed out, answers 401 unauthenticated', async () => {
    const res = await request(ctx.app).get('/api/machines');

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('for a member, answers an array with the area, meter hours as a number, checklist and required trainings', async () => {
    const area = await createArea(ctx.db, { name: `Welding bay ${suffix()}` });
    const machine = await createMachine(ctx.db, { name: `TIG ${suffix()}`, category: 'tig_welder', area_id: area.id, reservable: true, meter_hours: 1234.5 });
    const safety = await createTraining(ctx.db, { name: `Shop safety ${suffix()}`, machine_ids: [machine.id] });
    const tig = await createTraining(ctx.db, { name: `TIG welding ${suffix()}`, machine_ids: [machine.id] });
    await ctx.db('machines').where({ id: machine.id }).update({ safety_checklist: JSON.stringify(latheChecklist), requires_pin: true });
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/machines');

    expect(res.status).toBe(200);
    expect(Array.isArray(res.body)).toBe(true);
    expect(machineListSchema.safeParse(res.body).success).toBe(true);
    const listed = res.body.find((m: { id: string }) => m.id === machine.id);
    expect(listed).toEqual({
      id: machine.id,
      name: machine.name,
      category: 'tig_welder',
      area: area.name,
      areaId: area.id,
      reservable: true,
      meterHours: 1234.5,
      description: '',
      requiresPin: true,
      safetyChecklist: latheChecklist,
      trainings: [
        { id: safety.id, name: safety.name },
        { id: tig.id, name: tig.name },
      ].sort((a, b) => a.name.localeCompare(b.name)),
    });
    expect(typeof listed.meterHours).toBe('number');
  });
});

describe('GET /api/machines/:id', () => {
  it('for a member, answers the machine’s detail', async () => {
    const machine = await createMachine(ctx.db);
    const member = await signedIn(ctx, 'member');

    const res = await member.get(`/api/machines/${machine.id}`);

    expect(res.status).toBe(200);
    expect(machineDetailSchema.parse(res.body)).toMatchObject({ id: machine.id, name: machine.name, trainings: [], safetyChecklist: [] });
  });

  it('for an unknown id, answers 404 machine_not_found; for a bad id, 400 naming id', async () => {
    const member = await signedIn(ctx, 'member');

    const missing = await member.get(`/api/machines/${randomUUID()}`);
    const bad = await member.get('/api/machines/lathe-1');

    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('machine_not_found');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors)).toEqual(['id']);
  });

  it('when signed out, answers 401', async () => {
    const machine = await createMachine(ctx.db);
    expect((await request(ctx.app).get(`/api/machines/${machine.id}`)).status).toBe(401);
  });
});

describe('POST /api/machines', () => {
  it('for an admin, creates the machine with its trainings and safety checklist and answers 201', async () => {
    const training = await createTraining(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    const body = await machineBody({ trainingIds: [training.id, training.id], requiresPin: true });

    const res = await admin.post('/api/machines', body);

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: body.name,
      category: 'lathe',
      areaId: body.areaId,
      reservable: true,
      requiresPin: true,
      meterHours: 0,
      safetyChecklist: latheChecklist,
      trainings: [{ id: training.id, name: training.name }],
    });
    const links = await ctx.db('machine_trainings').where({ machine_id: res.body.id }).pluck('training_id');
    expect(links).toEqual([training.id]);
  });

  it('with an unknown training, answers 400 unknown_training naming trainingIds and creates nothing', async () => {
    const admin = await signedIn(ctx, 'admin');
    const body = await machineBody({ trainingIds: [randomUUID()] });

    const res = await admin.post('/api/machines', body);

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('unknown_training');
    expect(res.body.errors.trainingIds).toHaveLength(1);
    expect(await ctx.db('machines').first('id').where({ name: body.name })).toBeUndefined();
  });

  it('with an unknown area, answers 400 unknown_area naming areaId', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/machines', await machineBody({ areaId: randomUUID() }));

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('unknown_area');
    expect(res.body.errors.areaId).toBeDefined();
  });

  it('with a name another machine has, answers 409 machine_name_taken', async () => {
    const existing = await createMachine(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/machines', await machineBody({ name: existing.name.toLowerCase() }));

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('machine_name_taken');
  });

  it('with an unknown category and no name, answers 400 naming both', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/machines', await machineBody({ name: '', category: 'plasma_cutter' }));

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors).sort()).toEqual(['category', 'name']);
  });

  it('for a member or an instructor, answers 403 and creates nothing', async () => {
    const body = await machineBody();
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.post('/api/machines', body);
      expect(res.status, role).toBe(403);
    }
    const anonymous = await (await browser(ctx)).post('/api/machines', body);
    expect(anonymous.status).toBe(401);
    expect(await ctx.db('machines').first('id').where({ name: body.name })).toBeUndefined();
  });
});

describe('PUT /api/machines/:id', () => {
  it('for an admin, replaces the fields and the required trainings', async () => {
    const machine = await createMachine(ctx.db);
    const before = await createTraining(ctx.db, { machine_ids: [machine.id] });
    const after = await createTraining(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    const body = await machineBody({ name: machine.name, category: 'mill', reservable: false, trainingIds: [after.id], safetyChecklist: [] });

    const res = await admin.put(`/api/machines/${machine.id}`, body);

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: machine.id, category: 'mill', reservable: false, safetyChecklist: [], trainings: [{ id: after.id, name: after.name }] });
    const links = await ctx.db('machine_trainings').where({ machine_id: machine.id }).pluck('training_id');
    expect(links).not.toContain(before.id);
  });

  it('for an unknown machine, answers 404 machine_not_found', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.put(`/api/machines/${randomUUID()}`, await machineBody());

    expect(res.status).toBe(404);
    expect(res.body.code).toBe('machine_not_found');
  });

  it('with an unknown training, answers 400 and keeps the trainings it had', async () => {
    const machine = await createMachine(ctx.db);
    const kept = await createTraining(ctx.db, { machine_ids: [machine.id] });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.put(`/api/machines/${machine.id}`, await machineBody({ trainingIds: [randomUUID()] }));

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('unknown_training');
    expect(await ctx.db('machine_trainings').where({ machine_id: machine.id }).pluck('training_id')).toEqual([kept.id]);
  });

  it('for an instructor or a member, answers 403; signed out, 401; and changes nothing', async () => {
    const machine = await createMachine(ctx.db);
    const body = await machineBody();
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.put(`/api/machines/${machine.id}`, body);
      expect(res.status, role).toBe(403);
    }
    const anonymous = await (await browser(ctx)).put(`/api/machines/${machine.id}`, body);

    expect(anonymous.status).toBe(401);
    expect((await ctx.db('machines').first('name').where({ id: machine.id })).name).toBe(machine.name);
  });
});

describe('GET /api/areas', () => {
  it('for a member, answers the areas as an array of {id, name}', async () => {
    const area = await createArea(ctx.db, { name: `Cutting ${suffix()}` });
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/areas');

    expect(res.status).toBe(200);
    expect(res.body).toContainEqual({ id: area.id, name: area.name });
  });

  it('when signed out, answers 401', async () => {
    expect((await request(ctx.app).get('/api/areas')).status).toBe(401);
  });
});
