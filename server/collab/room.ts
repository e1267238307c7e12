import { WebSocket } from 'ws';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as Y from 'yjs';
import type { Database } from '../db/client';
import { PageProjector, type PageProjection } from './projection';
import {
  awarenessMessage,
  decodeMessage,
  inspectUpdate,
  syncStep1Message,
  syncStep2Message,
  updateMessage,
  type IncomingMessage,
} from './protocol';
import {
  appendUpdates,
  closeEditingSessions,
  compactPage,
  loadPage,
  saveProjection,
  saveSnapshot,
  type AcceptedUpdate,
} from './store';
import type { CollabTimings } from './timings';

export interface CollabUser {
  id: string;
  name: string;
}

export interface Connection {
  ws: WebSocket;
  user: CollabUser;
  /** From the member's role; the page lock is checked separately, per update. */
  canWrite: boolean;
  /** Awareness client ids this connection announced, removed when it leaves. */
  awarenessIds: Set<number>;
  alive: boolean;
}

/** What the server itself announces in awareness; clients read it to switch to read-only. */
export interface ServerAwarenessState {
  page: { locked: boolean };
}

/** Close codes of our own (4000–4999 is the application range). */
export const CLOSE_MALFORMED = 4400;
export const CLOSE_STORE_FAILED = 1011;
export const CLOSE_SHUTDOWN = 1001;

/**
 * One page's shared document in memory, with everyone connected to it. Every change a client
 * sends goes through one ordered pipeline: stored (committed) first, then applied to the
 * server's document and relayed. Background work (projection, snapshots, compaction, editing
 * sessions) runs in the same pipeline, so it always sees exactly the stored state.
 */
export class Room {
  readonly doc = new Y.Doc();
  readonly awareness = new awarenessProtocol.Awareness(this.doc);
  private readonly projector = new PageProjector();
  private readonly conns = new Map<WebSocket, Connection>();
  private tail: Promise<unknown> = Promise.resolve();
  private queue: (AcceptedUpdate & { conn: Connection })[] = [];
  private writeScheduled = false;
  private lastUpdateId: number;
  private uncompacted: number;
  private authorsSinceSnapshot: Set<string>;
  /** When the first edit after the latest history snapshot was stored (null: none since). */
  private firstEditSinceSnapshotAt: number | null;
  private lastUpdateByUser = new Map<string, number>();
  private projectionTimer: NodeJS.Timeout | null = null;
  private firstUnprojectedAt = 0;
  private readonly tickTimer: NodeJS.Timeout;
  private unloadTimer: NodeJS.Timeout | null = null;
  private holds = 0;
  private unloading: Promise<void> | null = null;

  private constructor(
    private readonly db: Database,
    readonly pageId: string,
    readonly notebookId: string,
    private locked: boolean,
    private readonly timings: CollabTimings,
    private readonly onUnloaded: () => void,
    stored: { lastUpdateId: number; uncompacted: number; authors: string[] },
  ) {
    this.lastUpdateId = stored.lastUpdateId;
    this.uncompacted = stored.uncompacted;
    this.authorsSinceSnapshot = new Set(stored.authors);
    this.firstEditSinceSnapshotAt = stored.authors.length > 0 ? Date.now() : null;
    this.doc.on('update', (update: Uint8Array, origin: unknown) => {
      this.projector.apply(update);
      this.relay(update, origin);
    });
    this.awareness.on('update', (changes: AwarenessChanges, origin: unknown) => this.relayAwareness(changes, origin));
    this.announceLock();
    this.tickTimer = setInterval(() => this.tick(), timings.tickMs);
    this.tickTimer.unref();
  }

  /** Builds the page's document from its compacted state plus the updates appended after it. */
  static async load(db: Database, pageId: string, timings: CollabTimings, onUnloaded: () => void): Promise<Room | null> {
    const stored = await loadPage(db, pageId);
    if (!stored) return null;
    // Sessions still open in the table belong to a process that ended without closing them.
    await closeEditingSessions(db, pageId, stored.notebookId);
    const room = new Room(db, pageId, stored.notebookId, stored.locked, timings, onUnloaded, {
      lastUpdateId: stored.updates.at(-1)?.id ?? stored.throughUpdateId,
      uncompacted: stored.updates.length,
      authors: stored.authorsSinceSnapshot,
    });
    Y.transact(room.doc, () => {
      if (stored.compacted) Y.applyUpdate(room.doc, stored.compacted);
      for (const row of stored.updates) Y.applyUpdate(room.doc, row.update);
    });
    if (room.uncompacted >= timings.compactAfterUpdates) void room.run(() => room.compact()).catch(logFailure('compaction'));
    return room;
  }

  /** Keeps the room loaded while a caller (an upgrade, a hub call) works with it. */
  hold(): boolean {
    if (this.unloading) return false;
    this.holds += 1;
    this.cancelUnload();
    return true;
  }

  release(): void {
    this.holds -= 1;
    this.scheduleUnload();
  }

  get unloaded(): Promise<void> {
    return this.unloading ?? Promise.resolve();
  }

  get isLocked(): boolean {
    return this.locked;
  }

  get connectionCount(): number {
    return this.conns.size;
  }

  join(ws: WebSocket, user: CollabUser, canWrite: boolean): void {
    const conn: Connection = { ws, user, canWrite, awarenessIds: new Set(), alive: true };
    this.conns.set(ws, conn);
    this.cancelUnload();
    ws.on('message', (data: Buffer) => this.receive(conn, new Uint8Array(data.buffer, data.byteOffset, data.byteLength)));
    ws.on('pong', () => {
      conn.alive = true;
    });
    ws.on('close', () => this.leave(conn));
    ws.on('error', () => ws.terminate());
    this.send(conn, syncStep1Message(this.doc));
    const present = [...this.awareness.getStates().keys()];
    if (present.length > 0) this.send(conn, awarenessMessage(this.awareness, present));
  }

  /** From now on updates are dropped (locked) or accepted again; connected clients are told. */
  async setLocked(locked: boolean): Promise<void> {
    const changed = this.locked !== locked;
    this.locked = locked;
    if (changed) this.announceLock();
    // Updates accepted before the lock are still stored; a sign-off closes the editing sessions.
    await this.flush();
    if (locked) await this.run(() => this.endSessions());
  }

  /** Waits until every update accepted so far is stored and applied. */
  flush(): Promise<void> {
    return this.run(async () => undefined);
  }

  async currentContent(): Promise<PageProjection> {
    return this.run(() => this.project());
  }

  takeSnapshot(reason: string): Promise<string> {
    return this.run(() => this.snapshot(reason));
  }

  /** Stores what is pending, closes everyone's connection and frees the memory. */
  async shutdown(): Promise<void> {
    for (const conn of this.conns.values()) conn.ws.close(CLOSE_SHUTDOWN, 'server shutting down');
    await this.unload(true);
  }

  private receive(conn: Connection, data: Uint8Array): void {
    let message: IncomingMessage;
    try {
      message = decodeMessage(data);
    } catch {
      conn.ws.close(CLOSE_MALFORMED, 'malformed message');
      return;
    }
    switch (message.kind) {
      case 'sync-step-1':
        this.send(conn, syncStep2Message(this.doc, message.stateVector));
        break;
      case 'update':
        this.receiveUpdate(conn, message.update);
        break;
      case 'awareness':
        try {
          awarenessProtocol.applyAwarenessUpdate(this.awareness, message.update, conn);
        } catch {
          conn.ws.close(CLOSE_MALFORMED, 'malformed awareness update');
        }
        break;
      case 'query-awareness':
        this.send(conn, awarenessMessage(this.awareness, [...this.awareness.getStates().keys()]));
        break;
    }
  }

  private receiveUpdate(conn: Connection, update: Uint8Array): void {
    // Readers, organisation viewers and locked pages: the change is dropped, never stored or relayed.
    if (!conn.canWrite || this.locked || this.unloading) return;
    let kind: 'changes' | 'empty';
    try {
      kind = inspectUpdate(update);
    } catch {
      conn.ws.close(CLOSE_MALFORMED, 'malformed update');
      return;
    }
    if (kind === 'empty') return;
    this.queue.push({ update, userId: conn.user.id, conn });
    if (!this.writeScheduled) {
      this.writeScheduled = true;
      void this.run(() => this.writeBatch());
    }
  }

  /** Group commit: everything that arrived while the previous write was in flight goes in one. */
  private async writeBatch(): Promise<void> {
    this.writeScheduled = false;
    const batch = this.queue.splice(0);
    if (batch.length === 0) return;
    const at = new Date();
    try {
      this.lastUpdateId = await appendUpdates(this.db, this.pageId, batch, at);
    } catch (error) {
      logFailure('storing updates')(error);
      // Not stored, so not acknowledged: the clients keep their changes and resend on reconnect.
      for (const conn of new Set(batch.map((b) => b.conn))) conn.ws.close(CLOSE_STORE_FAILED, 'could not store the change');
      return;
    }
    for (const entry of batch) {
      Y.applyUpdate(this.doc, entry.update, entry.conn);
      this.authorsSinceSnapshot.add(entry.userId);
      this.firstEditSinceSnapshotAt ??= at.getTime();
      this.lastUpdateByUser.set(entry.userId, at.getTime());
    }
    this.uncompacted += batch.length;
    this.scheduleProjection();
    if (this.uncompacted >= this.timings.compactAfterUpdates) void this.run(() => this.compact()).catch(logFailure('compaction'));
  }

  private relay(update: Uint8Array, origin: unknown): void {
    const message = updateMessage(update);
    for (const conn of this.conns.values()) if (conn !== origin) this.send(conn, message);
  }

  private relayAwareness({ added, updated, removed }: AwarenessChanges, origin: unknown): void {
    const conn = [...this.conns.values()].find((c) => c === origin);
    if (conn) {
      for (const id of added) conn.awarenessIds.add(id);
      for (const id of removed) conn.awarenessIds.delete(id);
    }
    const message = awarenessMessage(this.awareness, [...added, ...updated, ...removed]);
    for (const other of this.conns.values()) this.send(other, message);
  }

  private announceLock(): void {
    const state: ServerAwarenessState = { page: { locked: this.locked } };
    this.awareness.setLocalState(state);
  }

  private send(conn: Connection, message: Uint8Array): void {
    if (conn.ws.readyState !== WebSocket.OPEN) return;
    conn.ws.send(message, (error) => {
      if (error) conn.ws.terminate();
    });
  }

  private leave(conn: Connection): void {
    if (!this.conns.delete(conn.ws)) return;
    awarenessProtocol.removeAwarenessStates(this.awareness, [...conn.awarenessIds], null);
    this.scheduleUnload();
  }

  private tick(): void {
    for (const conn of this.conns.values()) {
      if (!conn.alive) {
        conn.ws.terminate();
        continue;
      }
      conn.alive = false;
      conn.ws.ping();
    }
    const now = Date.now();
    const idle = [...this.lastUpdateByUser].filter(([, at]) => now - at >= this.timings.sessionIdleMs).map(([userId]) => userId);
    if (idle.length > 0) void this.run(() => this.endSessions(idle)).catch(logFailure('closing editing sessions'));
    if (this.firstEditSinceSnapshotAt !== null && now - this.firstEditSinceSnapshotAt >= this.timings.snapshotEveryMs) {
      void this.run(() => this.snapshot('activity')).catch(logFailure('history snapshot'));
    }
  }

  private scheduleProjection(): void {
    const now = Date.now();
    if (this.projectionTimer) clearTimeout(this.projectionTimer);
    else this.firstUnprojectedAt = now;
    const due = Math.min(this.timings.projectionDelayMs, this.firstUnprojectedAt + this.timings.projectionMaxDelayMs - now);
    this.projectionTimer = setTimeout(() => void this.run(() => this.project()).catch(logFailure('projection')), Math.max(0, due));
    this.projectionTimer.unref();
  }

  /** Rebuilds page_content; the page's updatedAt moves only when there were changes to project. */
  private async project(): Promise<PageProjection> {
    const changed = this.projectionTimer !== null;
    if (this.projectionTimer) clearTimeout(this.projectionTimer);
    this.projectionTimer = null;
    const projection = this.projector.project();
    await saveProjection(this.db, this.pageId, projection, { touchPage: changed });
    return projection;
  }

  private async snapshot(reason: string): Promise<string> {
    const authors = [...this.authorsSinceSnapshot];
    const id = await saveSnapshot(this.db, this.pageId, reason, Y.encodeStateAsUpdate(this.doc), authors);
    for (const author of authors) this.authorsSinceSnapshot.delete(author);
    this.firstEditSinceSnapshotAt = null;
    return id;
  }

  private async compact(): Promise<void> {
    if (this.uncompacted === 0) return;
    await compactPage(this.db, this.pageId, Y.encodeStateAsUpdate(this.doc), this.lastUpdateId);
    this.uncompacted = 0;
  }

  private async endSessions(userIds?: string[]): Promise<void> {
    await closeEditingSessions(this.db, this.pageId, this.notebookId, userIds);
    for (const userId of userIds ?? [...this.lastUpdateByUser.keys()]) this.lastUpdateByUser.delete(userId);
  }

  private run<T>(task: () => Promise<T>): Promise<T> {
    const result = this.tail.then(task);
    this.tail = result.catch(() => undefined);
    return result;
  }

  private cancelUnload(): void {
    if (this.unloadTimer) clearTimeout(this.unloadTimer);
    this.unloadTimer = null;
  }

  private scheduleUnload(): void {
    if (this.conns.size > 0 || this.holds > 0 || this.unloadTimer || this.unloading) return;
    this.unloadTimer = setTimeout(() => void this.unload(false), this.timings.unloadAfterMs);
    this.unloadTimer.unref();
  }

  private unload(force: boolean): Promise<void> {
    this.cancelUnload();
    if (this.unloading) return this.unloading;
    if (!force && (this.conns.size > 0 || this.holds > 0)) return Promise.resolve();
    this.unloading = this.run(async () => {
      if (this.projectionTimer) await this.project();
      if (this.authorsSinceSnapshot.size > 0) await this.snapshot('idle');
      await this.endSessions();
      await this.compact();
    })
      .catch(logFailure('unloading a page'))
      .finally(() => {
        clearInterval(this.tickTimer);
        this.projector.destroy();
        this.awareness.destroy();
        this.doc.destroy();
        this.onUnloaded();
      });
    return this.unloading;
  }
}

interface AwarenessChanges {
  added: number[];
  updated: number[];
  removed: number[];
}

function logFailure(what: string) {
  return (error: unknown) => console.error(`[collab] ${what} failed:`, error);
}
