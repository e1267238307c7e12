import { asc, desc, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { verifyChain } from '../../server/audit/chain';
import { auditEvents } from '../../server/db/schema';
import { ApiClient } from '../support/api';
import { startServer, type TestServer } from '../support/server';
import { newPage, signBody, signingGroup, type SigningGroup } from '../support/signing';

let server: TestServer;
let g: SigningGroup;
let pageId: string;

beforeAll(async () => {
  server = await startServer();
  g = await signingGroup(server);
  pageId = await newPage(g.author.api, g.notebookId, 'Audited page');
  await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
});
afterAll(() => server.close());

/** Postgres reports the trigger's refusal as an error whose message names the operation. */
async function refusal(statement: Promise<unknown>): Promise<string> {
  try {
    await statement;
  } catch (error) {
    const e = error as { message: string; cause?: { message: string } };
    return e.cause?.message ?? e.message;
  }
  throw new Error('the statement was accepted');
}

/**
 * Alters stored events the only way the trigger leaves open: `session_replication_role = replica`
 * (superuser only; the test cluster's user is one) skips ordinary triggers for this transaction.
 * We do it inside the test's own transaction and roll back, so the shared trail stays intact for
 * every other test; the check runs inside the same transaction and sees the altered rows.
 */
async function inAlteredTrail(alter: (tx: Parameters<Parameters<typeof server.deps.db.transaction>[0]>[0]) => Promise<unknown>) {
  let check: Awaited<ReturnType<typeof verifyChain>> | undefined;
  await server.deps.db
    .transaction(async (tx) => {
      await tx.execute(sql`set local session_replication_role = replica`);
      await alter(tx);
      check = await verifyChain(tx);
      tx.rollback();
    })
    .catch((error: Error) => {
      if (!/rollback/i.test(error.message)) throw error;
    });
  return check!;
}

// 21 CFR 11.10(e): audit trails are secure and record changes without obscuring earlier entries;
// the append-only rule is enforced by the database itself, whoever connects.
describe('the audit trail is append-only', () => {
  it('UPDATE, DELETE and TRUNCATE on audit_events are refused by the trigger', async () => {
    const { db } = server.deps;
    const [latest] = await db.select().from(auditEvents).orderBy(desc(auditEvents.id)).limit(1);
    expect(await refusal(db.update(auditEvents).set({ actorName: 'Nobody' }).where(eq(auditEvents.id, latest.id)))).toMatch(/append-only: UPDATE/);
    expect(await refusal(db.delete(auditEvents).where(eq(auditEvents.id, latest.id)))).toMatch(/append-only: DELETE/);
    expect(await refusal(db.execute(sql`truncate audit_events`))).toMatch(/append-only: TRUNCATE/);
    const [still] = await db.select().from(auditEvents).where(eq(auditEvents.id, latest.id));
    expect(still).toEqual(latest);
  });
});

// 21 CFR 11.10(a) (discern invalid or altered records) and 11.10(e) (changes do not obscure
// earlier entries); chaining each event to the previous one by hash is common practice, no source.
describe('the hash chain', () => {
  it('verifies over the whole trail', async () => {
    const check = await verifyChain(server.deps.db);
    expect(check).toMatchObject({ intact: true, firstBrokenEventId: null });
    expect(check.checked).toBeGreaterThan(0);
  });

  it('breaks at an event whose details were altered', async () => {
    const [signedEvent] = await server.deps.db.select().from(auditEvents).where(eq(auditEvents.pageId, pageId)).orderBy(desc(auditEvents.id)).limit(1);
    const check = await inAlteredTrail((tx) =>
      tx.update(auditEvents).set({ details: { ...(signedEvent.details as object), supervisorName: 'Someone Else' } }).where(eq(auditEvents.id, signedEvent.id)),
    );
    expect(check).toMatchObject({ intact: false, firstBrokenEventId: signedEvent.id });
    expect(check.problem).toMatch(/changed after it was recorded/);
  });

  it('breaks where an event was removed, even if the stored hashes were recomputed', async () => {
    const [first, second] = await server.deps.db.select().from(auditEvents).where(eq(auditEvents.pageId, pageId)).orderBy(asc(auditEvents.id)).limit(2);
    const check = await inAlteredTrail((tx) => tx.delete(auditEvents).where(eq(auditEvents.id, first.id)));
    expect(check.intact).toBe(false);
    expect(check.firstBrokenEventId).toBeLessThanOrEqual(second.id);
    expect(check.problem).toMatch(/does not follow/);
  });
});

// 21 CFR 11.10(e): the audit trail is available for review and copying; 11.10(b): accurate and
// complete copies in human-readable and electronic form. 11.10(d): access limited to authorised
// people (outsiders get 404 as everywhere in the API, anonymous callers 401, RFC 9110 §15.5.2).
describe('audit trail views and export', () => {
  it('per page: the page’s events in order, with the chain state; readable by a reader, not by outsiders', async () => {
    const trail = await g.reader.api.get(`/api/pages/${pageId}/audit`);
    expect(trail.status).toBe(200);
    expect(trail.body.events.map((e: { type: string }) => e.type)).toEqual(['page.created', 'page.signed', 'countersign.requested']);
    expect(trail.body.chain.intact).toBe(true);
    expect((await g.outsider.api.get(`/api/pages/${pageId}/audit`)).status).toBe(404);
    expect((await new ApiClient(server.url).get(`/api/pages/${pageId}/audit`)).status).toBe(401);
  });

  it('per notebook: membership changes and every page’s events', async () => {
    const trail = await g.reader.api.get(`/api/notebooks/${g.notebookId}/audit`);
    expect(trail.status).toBe(200);
    const types = trail.body.events.map((e: { type: string }) => e.type);
    expect(types).toEqual(expect.arrayContaining(['notebook.created', 'page.created', 'page.signed']));
    expect(types.some((t: string) => t.startsWith('member'))).toBe(true);
    expect(trail.body.events.every((e: { notebookId: string | null; pageId: string | null }) => e.notebookId === g.notebookId)).toBe(true);
  });

  it('exports CSV (RFC 4180) with the hashes of each event', async () => {
    const response = await fetch(`${server.url}/api/notebooks/${g.notebookId}/audit.csv`, { headers: { cookie: g.reader.api.sessionCookie } });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
    const text = await response.text();
    const [header] = text.split('\n');
    expect(header).toBe('event_id,occurred_at_utc,type,actor_id,actor_name,notebook_id,page_id,details,previous_hash,hash');
    const trail = (await g.reader.api.get(`/api/notebooks/${g.notebookId}/audit`)).body.events as { hash: string }[];
    for (const event of trail) expect(text).toContain(event.hash);
    // RFC 4180 section 2 (6, 7): fields with commas or quotes are quoted, inner quotes doubled.
    expect(text).toMatch(/,"\{""/);
  });
});
