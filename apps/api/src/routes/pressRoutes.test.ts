import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEntry } from '../models';
import { app, createWorld, unique } from '../test/harness';

// Common practice: a small die-cutting press takes sheets up to about 22 × 30 in and runs about
// 2,000 to 5,000 sheets an hour, up to about 7,800 on a fast one.
const platen = () => ({
  name: `Platen ${unique()}`,
  kind: 'platen',
  maxSheetWidthIn: 22,
  maxSheetLengthIn: 30,
  typicalSpeedSph: 5000,
  maxSpeedSph: 7800,
});

describe('presses', () => {
  it('creates, lists and edits a press, with an audit entry for each change', async () => {
    const { tokens, users } = await createWorld();
    const auth = { Authorization: `Bearer ${tokens.printerAdmin}` };
    const created = await request(app).post('/api/presses').set(auth).send(platen());
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ kind: 'platen', maxSheetWidthIn: 22, active: true });

    const edited = await request(app)
      .patch(`/api/presses/${created.body.id}`)
      .set(auth)
      .send({ active: false, typicalSpeedSph: 4500 });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ active: false, typicalSpeedSph: 4500, maxSpeedSph: 7800 });

    const list = await request(app)
      .get('/api/presses')
      .set({ Authorization: `Bearer ${tokens.buyer}` });
    expect(list.body.map((p: { id: number }) => p.id)).toContain(created.body.id);

    const audit = await AuditEntry.query().where({ entity: 'press', entityId: created.body.id }).orderBy('id');
    expect(audit.map((a) => [a.action, a.actorUserId])).toEqual([
      ['created', users.printerAdmin.id],
      ['updated', users.printerAdmin.id],
    ]);
  });

  it('keeps how the press runs: shifts a day, their length and the cutting rule height', async () => {
    const { tokens } = await createWorld();
    const auth = { Authorization: `Bearer ${tokens.printerAdmin}` };
    const created = await request(app).post('/api/presses').set(auth).send(platen());
    // Common practice: one shift of 8 hours, and 0.937 in cutting rule, unless said otherwise.
    expect(created.body).toMatchObject({ shiftsPerDay: 1, shiftHours: 8, cuttingRuleHeightIn: 0.937 });
    const edited = await request(app)
      .patch(`/api/presses/${created.body.id}`)
      .set(auth)
      .send({ shiftsPerDay: 2, shiftHours: 7.5, cuttingRuleHeightIn: 0.918 });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect(edited.body).toMatchObject({ shiftsPerDay: 2, shiftHours: 7.5, cuttingRuleHeightIn: 0.918 });
    const height = await request(app)
      .patch(`/api/presses/${created.body.id}`)
      .set(auth)
      .send({ cuttingRuleHeightIn: 0.95 });
    expect(height.status).toBe(400);
    expect(Object.keys(height.body.error.fields)).toEqual(['cuttingRuleHeightIn']);
    // Three shifts of 8.5 hours do not fit a day; checked against the stored shifts too (7.5 h now).
    const day = await request(app)
      .patch(`/api/presses/${created.body.id}`)
      .set(auth)
      .send({ shiftsPerDay: 3, shiftHours: 8.5 });
    expect(day.status).toBe(400);
    expect(Object.keys(day.body.error.fields)).toEqual(['shiftHours']);
    const third = await request(app).patch(`/api/presses/${created.body.id}`).set(auth).send({ shiftsPerDay: 3 });
    expect(third.status).toBe(200);
    const longer = await request(app).patch(`/api/presses/${created.body.id}`).set(auth).send({ shiftHours: 9 });
    expect(longer.status).toBe(400);
    expect(Object.keys(longer.body.error.fields)).toEqual(['shiftHours']);
  });

  it('names every invalid field', async () => {
    const { tokens } = await createWorld();
    const res = await request(app).post('/api/presses').set('Authorization', `Bearer ${tokens.printerAdmin}`).send({
      name: ' ',
      kind: 'laser',
      maxSheetWidthIn: -3,
      maxSheetLengthIn: '30',
      typicalSpeedSph: 4000.5,
      maxSpeedSph: 0,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(
      ['kind', 'maxSheetLengthIn', 'maxSheetWidthIn', 'maxSpeedSph', 'name', 'typicalSpeedSph'].sort(),
    );
    expect(res.body.error.message).toContain('name');
    // A side too small to store to the hundredth of an inch is refused, not saved as 0.
    const tiny = await request(app).post('/api/presses').set('Authorization', `Bearer ${tokens.printerAdmin}`).send({
      name: 'Tiny',
      kind: 'platen',
      maxSheetWidthIn: 1e-300,
      maxSheetLengthIn: 30,
      typicalSpeedSph: 4000,
      maxSpeedSph: 5000,
    });
    expect(tiny.status).toBe(400);
    expect(tiny.body.error.fields.maxSheetWidthIn).toBe('A sheet side is at least 1 in (25.4 mm)');
  });

  it('keeps the typical speed at or below the maximum, on create and on a partial edit', async () => {
    const { tokens } = await createWorld();
    const auth = { Authorization: `Bearer ${tokens.printerAdmin}` };
    const tooFast = await request(app)
      .post('/api/presses')
      .set(auth)
      .send({ ...platen(), typicalSpeedSph: 9000 });
    expect(tooFast.status).toBe(400);
    expect(tooFast.body.error.fields.typicalSpeedSph).toMatch(/maximum/);

    const created = await request(app).post('/api/presses').set(auth).send(platen());
    const edit = await request(app).patch(`/api/presses/${created.body.id}`).set(auth).send({ maxSpeedSph: 3000 });
    expect(edit.status).toBe(400);
    expect(edit.body.error.fields.typicalSpeedSph).toBeTruthy();
  });

  it('refuses a second press of the same name in one organisation', async () => {
    const { tokens } = await createWorld();
    const auth = { Authorization: `Bearer ${tokens.printerAdmin}` };
    const body = platen();
    expect((await request(app).post('/api/presses').set(auth).send(body)).status).toBe(201);
    const again = await request(app).post('/api/presses').set(auth).send(body);
    expect(again.status).toBe(409);
    expect(again.body.error.fields.name).toBeTruthy();
  });

  it('refuses an empty edit', async () => {
    const { tokens } = await createWorld();
    const auth = { Authorization: `Bearer ${tokens.printerAdmin}` };
    const created = await request(app).post('/api/presses').set(auth).send(platen());
    const res = await request(app).patch(`/api/presses/${created.body.id}`).set(auth).send({});
    expect(res.status).toBe(400);
  });
});
