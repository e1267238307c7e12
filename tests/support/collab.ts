import { createBinding, syncLexicalUpdateToYjs, syncYjsChangesToLexical } from '@lexical/yjs';
import {
  $createParagraphNode,
  $createTextNode,
  $getRoot,
  $isParagraphNode,
  COLLABORATION_TAG,
  createEditor,
  type LexicalEditor,
  type LexicalNode,
} from 'lexical';
import http from 'node:http';
import { WebSocket } from 'ws';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';
import { attachCollab, type CollabTimings } from '../../server/collab';
import { silentProvider } from '../../server/collab/projection';
import { createApp } from '../../server/app';
import type { AppDeps } from '../../server/context';
import { createDeps } from '../../server/deps';
import { loadConfig } from '../../server/env';
import { freePort } from '../../server/services/ports';
import { pageNodes } from '../../shared/editor';
import type { TestServer } from './server';

/** ws takes headers in its constructor; y-websocket only passes (url, protocols). */
export function webSocketWithCookie(cookie: string): typeof globalThis.WebSocket {
  class CookieWebSocket extends WebSocket {
    constructor(url: string | URL, protocols?: string | string[]) {
      super(url, protocols, { headers: cookie ? { cookie } : {} });
    }
  }
  return CookieWebSocket as unknown as typeof globalThis.WebSocket;
}

export function collabUrl(baseUrl: string): string {
  return `${baseUrl.replace(/^http/, 'ws')}/collab`;
}

export interface CollabClient {
  doc: Y.Doc;
  provider: WebsocketProvider;
  /** The Lexical root shared type (what the page editor binds to). */
  root: Y.XmlText;
  destroy(): void;
}

/** A Yjs client in Node, as the browser editor connects: y-websocket with the session cookie. */
export async function connectCollab(baseUrl: string, pageId: string, cookie: string): Promise<CollabClient> {
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(collabUrl(baseUrl), pageId, doc, {
    WebSocketPolyfill: webSocketWithCookie(cookie),
    disableBc: true,
  });
  const client: CollabClient = {
    doc,
    provider,
    root: doc.get('root', Y.XmlText),
    destroy() {
      provider.destroy();
      doc.destroy();
    },
  };
  try {
    await waitFor(() => provider.synced, `sync with ${pageId}`);
  } catch (error) {
    client.destroy();
    throw error;
  }
  return client;
}

export async function waitFor(condition: () => boolean, what: string, timeoutMs = 10_000): Promise<void> {
  const started = Date.now();
  while (!condition()) {
    if (Date.now() - started > timeoutMs) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}

/** Polls an async reading until it satisfies `ok` (background work such as the projection). */
export async function eventually<T>(read: () => Promise<T>, ok: (value: T) => boolean, what: string, timeoutMs = 10_000): Promise<T> {
  const started = Date.now();
  for (;;) {
    const value = await read();
    if (ok(value)) return value;
    if (Date.now() - started > timeoutMs) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

/**
 * Resolves once the server has handled everything this client sent before: the server reads a
 * connection's messages in order, so the answer to an awareness query comes after them.
 */
export async function serverCaughtUp(client: CollabClient): Promise<void> {
  const ws = client.provider.ws as unknown as WebSocket;
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('no answer to the awareness query')), 10_000);
    // y-websocket asks for ArrayBuffers; the first byte is the message type (1 = awareness).
    const onMessage = (data: ArrayBuffer | Buffer) => {
      if (new Uint8Array(data)[0] !== 1) return;
      clearTimeout(timer);
      ws.off('message', onMessage);
      resolve();
    };
    ws.on('message', onMessage);
    ws.send(Uint8Array.of(3));
  });
}

/** What the upgrade of a raw websocket ends in: its HTTP refusal status, or 101 when accepted. */
export function upgradeStatus(url: string, headers: Record<string, string>): Promise<number> {
  return new Promise((resolve, reject) => {
    const ws = new WebSocket(url, { headers });
    ws.on('unexpected-response', (_req, res: http.IncomingMessage) => {
      resolve(res.statusCode ?? 0);
      res.resume();
      ws.terminate();
    });
    ws.on('open', () => {
      resolve(101);
      ws.close();
    });
    ws.on('error', (error) => reject(error));
  });
}

/**
 * A Lexical editor bound both ways to a client's document, with the page's node types: what it
 * writes reaches the server exactly as the browser editor's edits do.
 */
export function lexicalEditorOn(client: Pick<CollabClient, 'doc'>): LexicalEditor {
  const editor = createEditor({ namespace: 'test-editor', nodes: pageNodes, onError: (error) => { throw error; } });
  const binding = createBinding(editor, silentProvider, 'page', client.doc, new Map([['page', client.doc]]));
  editor.registerUpdateListener(({ prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags }) => {
    syncLexicalUpdateToYjs(binding, silentProvider, prevEditorState, editorState, dirtyElements, dirtyLeaves, normalizedNodes, tags);
  });
  const shared = binding.root.getSharedType();
  shared.observeDeep((events, transaction) => {
    if (transaction.origin !== binding) syncYjsChangesToLexical(binding, silentProvider, events, false);
  });
  // The client has synced already (the page's first paragraph at least): read the document in the
  // way the binding loads a shared element it has not seen before.
  if (shared.length > 0) {
    editor.update(
      () => {
        binding.root.applyChildrenYjsDelta(binding, shared.toDelta());
        binding.root.syncChildrenFromYjs(binding);
      },
      { discrete: true, tag: COLLABORATION_TAG },
    );
  }
  return editor;
}

/**
 * Writes paragraphs (and any further blocks) the way a person does on a new page: the first text
 * goes into the page's empty first paragraph, everything else after it.
 */
export function writeBlocks(editor: LexicalEditor, paragraphs: string[], more: () => LexicalNode[] = () => []): void {
  editor.update(
    () => {
      const root = $getRoot();
      const only = root.getChildrenSize() === 1 ? root.getFirstChild() : null;
      const texts = [...paragraphs];
      if ($isParagraphNode(only) && only.getTextContentSize() === 0 && texts.length > 0) only.append($createTextNode(texts.shift()));
      for (const text of texts) root.append($createParagraphNode().append($createTextNode(text)));
      root.append(...more());
    },
    { discrete: true },
  );
}

/**
 * The app with collaboration on shortened timings (projection, compaction, unloading), for the
 * tests of background work; everything else is the real server.
 */
export async function startCollabServer(timings: Partial<CollabTimings>): Promise<TestServer & { deps: AppDeps }> {
  const port = await freePort();
  const config = loadConfig({ ...process.env, PORT: String(port), HOST: '127.0.0.1' });
  const deps = await createDeps(config);
  const server = http.createServer(createApp(deps));
  const collab = attachCollab(server, deps, timings);
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  return {
    url: `http://127.0.0.1:${port}`,
    deps,
    async close() {
      await collab.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await deps.pool.end();
    },
  };
}
