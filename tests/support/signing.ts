import { afterAll, beforeAll } from 'vitest';
import type { ApiClient } from './api';
import { signedIn } from './api';
import { connectCollab, lexicalEditorOn, serverCaughtUp, writeBlocks } from './collab';
import { createPerson, latestMailTo, signedInAs, type TestPerson } from './fixtures';
import { startServer, type TestServer } from './server';

export interface Member {
  person: TestPerson;
  api: ApiClient;
}

/**
 * A notebook of one's own with everyone the signing rules distinguish: the author (owner), a
 * co-editor, two supervisors (editors), a reader with the viewer role, and an outside supervisor
 * who is not a member.
 */
export interface SigningGroup {
  notebookId: string;
  author: Member;
  coEditor: Member;
  supervisor: Member;
  supervisor2: Member;
  reader: Member;
  outsider: Member;
  admin: ApiClient;
}

/** A new person of `role`, signed in on `server`. */
export async function member(server: TestServer, role: TestPerson['role'], prefix: string): Promise<Member> {
  const person = await createPerson(server.deps, role, prefix);
  return { person, api: await signedInAs(server.url, person) };
}

export async function signingGroup(server: TestServer): Promise<SigningGroup> {
  const author = await member(server, 'chemist', 'author');
  const coEditor = await member(server, 'chemist', 'coeditor');
  const supervisor = await member(server, 'supervisor', 'supervisor');
  const supervisor2 = await member(server, 'supervisor', 'supervisor2');
  const reader = await member(server, 'viewer', 'reader');
  const outsider = await member(server, 'supervisor', 'outsider');
  const notebook = await author.api.post('/api/notebooks', { title: 'Signing tests', description: '' });
  if (notebook.status !== 201) throw new Error(`notebook: ${notebook.status} ${JSON.stringify(notebook.body)}`);
  const notebookId = notebook.body.id as string;
  for (const [m, role] of [
    [coEditor, 'editor'],
    [supervisor, 'editor'],
    [supervisor2, 'editor'],
    [reader, 'reader'],
  ] as const) {
    const added = await author.api.put(`/api/notebooks/${notebookId}/members`, { userId: m.person.id, role });
    if (added.status >= 300) throw new Error(`member: ${added.status} ${JSON.stringify(added.body)}`);
  }
  return { notebookId, author, coEditor, supervisor, supervisor2, reader, outsider, admin: await signedIn(server.url, 'admin@saltmarsh.test') };
}

/** A signing group together with the server it lives on. */
export interface SigningFrame extends SigningGroup {
  server: TestServer;
}

/**
 * The signing tests' common frame, registered as this file's hooks: a server of the file's own
 * with a fresh signing group on it, closed after the file's tests.
 */
export function signingFrame(): SigningFrame {
  const frame = {} as SigningFrame;
  beforeAll(async () => {
    frame.server = await startServer();
    Object.assign(frame, await signingGroup(frame.server));
  });
  afterAll(() => frame.server?.close());
  return frame;
}

export async function newPage(api: ApiClient, notebookId: string, title: string): Promise<string> {
  const response = await api.post(`/api/notebooks/${notebookId}/pages`, { title });
  if (response.status !== 201) throw new Error(`page: ${response.status} ${JSON.stringify(response.body)}`);
  return response.body.id;
}

/** Writes paragraphs through the real collaboration websocket, as the browser editor does. */
export async function writeOnPage(server: TestServer, api: ApiClient, pageId: string, paragraphs: string[]): Promise<void> {
  const client = await connectCollab(server.url, pageId, api.sessionCookie);
  try {
    writeBlocks(lexicalEditorOn(client), paragraphs);
    await serverCaughtUp(client);
  } finally {
    client.destroy();
  }
}

export const signBody = (person: TestPerson, supervisorId: string, meaning = 'performed') => ({
  email: person.email,
  password: person.password,
  meaning,
  supervisorId,
});

export const countersignBody = (person: TestPerson, meaning = 'witnessed') => ({ email: person.email, password: person.password, meaning });

export const addendumBody = (person: TestPerson, text: string, supervisorId?: string) => ({
  email: person.email,
  password: person.password,
  meaning: 'performed',
  text,
  ...(supervisorId ? { supervisorId } : {}),
});

export interface VerifyReport {
  intact: boolean;
  currentHash: string;
  signatures: { role: string; addendumId: string | null; withdrawn: boolean; intact: boolean; changes: string[] }[];
}

/** The page's verification report as `api` reads it; anything but a 200 fails the test. */
export async function verifyReport(api: ApiClient, pageId: string): Promise<VerifyReport> {
  const response = await api.get<VerifyReport>(`/api/pages/${pageId}/verify`);
  if (response.status !== 200) throw new Error(`verify: ${response.status} ${JSON.stringify(response.body)}`);
  return response.body;
}

/** The caught mail arrives a moment after the send; wait for the message we expect. */
export async function mailTo(admin: ApiClient, address: string, subjectIncludes: string): Promise<{ subject: string; text: string }> {
  const started = Date.now();
  for (;;) {
    const mail = await latestMailTo(admin, address);
    if (mail?.subject.includes(subjectIncludes)) return mail;
    if (Date.now() - started > 10_000) throw new Error(`no mail "${subjectIncludes}" to ${address}; latest: ${mail?.subject}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}
