import knexFactory from 'knex';
import { afterAll, describe, expect, it } from 'vitest';
import { createMailer } from '../mailer';
import { deliverEmail, retryDelayMs } from './deliverEmail';
import { sweepOutbox } from './sweepOutbox';

// Against the real PostgreSQL and the real SMTP catcher that `npm test` starts.
const knex = knexFactory({ client: 'pg', connection: process.env.DATABASE_URL });
const mailer = createMailer(process.env.SMTP_URL!);
// Nothing listens on port 9 (discard) here: a stand-in for an SMTP server that is down.
const downMailer = createMailer('smtp://127.0.0.1:9');
const FROM = 'Kerfmark <no-reply@kerfmark.test>';

afterAll(async () => {
  mailer.close();
  downMailer.close();
  await knex.destroy();
});

async function outboxRow(to: string) {
  const [row] = await knex('email_outbox')
    .insert({
      to_address: to,
      subject: `Test ${to}`,
      text_body: 'Plain text body',
      kind: 'test',
      next_attempt_at: new Date(Date.now() + 3600_000),
    })
    .returning('*');
  return row as { id: number };
}

async function caught(to: string): Promise<Array<{ subject: string; messageId: string }>> {
  const res = await fetch(`${process.env.MAIL_CATCHER_URL}/api/messages?to=${encodeURIComponent(to)}`);
  return (await res.json()) as Array<{ subject: string; messageId: string }>;
}

describe('e-mail delivery from the outbox', () => {
  it('sends once when the same job runs twice at the same time', async () => {
    const to = `once-${Date.now()}@test.example`;
    const row = await outboxRow(to);
    const results = await Promise.all([
      deliverEmail(knex, mailer, FROM, row.id),
      deliverEmail(knex, mailer, FROM, row.id),
    ]);
    expect(results.sort()).toEqual(['sent', 'skipped']);
    expect(await deliverEmail(knex, mailer, FROM, row.id)).toBe('skipped');
    const messages = await caught(to);
    expect(messages).toHaveLength(1);
    expect(messages[0]!.messageId).toBe(`<outbox-${row.id}@kerfmark>`);
  });

  it('keeps the e-mail while SMTP is down and delivers it once when it is back', async () => {
    const to = `later-${Date.now()}@test.example`;
    const row = await outboxRow(to);
    expect(await deliverEmail(knex, downMailer, FROM, row.id)).toBe('retry-later');
    const waiting = await knex('email_outbox').where({ id: row.id }).first();
    expect(waiting).toMatchObject({ status: 'pending', attempts: 1 });
    expect(waiting.last_error).toBeTruthy();
    expect(new Date(waiting.next_attempt_at).getTime()).toBeGreaterThan(Date.now() + 50_000);
    expect(await caught(to)).toHaveLength(0);

    // Its retry time comes round; the sweep (which also stands in for a lost queue job) sends it.
    await knex('email_outbox')
      .where({ id: row.id })
      .update({ next_attempt_at: new Date(Date.now() - 1000) });
    // The running worker's own sweep may take it first; either way it arrives exactly once.
    await sweepOutbox(knex, mailer, FROM);
    await sweepOutbox(knex, mailer, FROM);
    await expect.poll(async () => (await caught(to)).length, { timeout: 10_000 }).toBe(1);
    await new Promise((r) => setTimeout(r, 2500)); // past another sweep of the worker
    expect(await caught(to)).toHaveLength(1);
    expect(await knex('email_outbox').where({ id: row.id }).first()).toMatchObject({ status: 'sent', attempts: 2 });
  });

  it('backs off 1, 2, 4 … minutes, capped at an hour', () => {
    expect([1, 2, 3, 4, 7, 8, 12].map((n) => retryDelayMs(n) / 60_000)).toEqual([1, 2, 4, 8, 60, 60, 60]);
  });
});
