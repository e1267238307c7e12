import { WebSocket } from 'ws';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as Y from 'yjs';
import type { Database } from '../db/client';
import { checkConnectionAccess, type AccessVerdict } from './access';
import { firstParagraphUpdate } from './firstParagraph';
import { PageProjector, type PageProjection } from './projection';
import {
  awarenessMessage,
  decodeAwarenessEntries,
  decodeMessage,
  encodeAwarenessEntries,
  inspectUpdate,
  syncStep1Message,
  syncStep2Message,
  updateMessage,
  type AwarenessEntry,
  type IncomingMessage,
} from './protocol';
import {
  appendFirstUpdate,
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

/** Who opened a connection and what the upgrade allowed. */
export interface ConnectionGrant {
  user: CollabUser;
  /** The session the upgrade was signed in with; checked again while the connection lasts. */
  sessionId: string;
  canWrite: boolean;
}

export interface Connection extends ConnectionGrant {
  ws: WebSocket;
  /** The awareness client id this connection introduced itself with; its state goes when it leaves. */
  awarenessIds: Set<number>;
  alive: boolean;
  /** When session and membership were last confirmed (ms). */
  checkedAt: number;
  /** Access checks under way (they run one after another); updates wait in `held` meanwhile. */
  pendingChecks: number;
  lastCheck: Promise<void>;
  held: Uint8Array[];
  /**
   * Some change from this connection was dropped: its later changes build on content the server
   * never took, so they could not be applied until the client syncs afresh.
   */
  diverged: boolean;
  /** Closed by the server; whatever still arrives on it is ignored. */
  closed: boolean;
}

/**
 * What the server itself announces in awareness; clients read it to switch to read-only: the
 * page's lock, and who is connected without write access (readers, organisation viewers), so
 * someone demoted while the page is open learns it at once instead of typing into nothing.
 */
export interface ServerAwarenessState {
  page: { locked: boolean };
  /** User ids, sorted, of the people whose open connections are read-only. */
  readOnlyUsers: string[];
}

/** Close codes of our own (4000–4999 is the application range). */
export const CLOSE_MALFORMED = 4400;
/** The session was signed out, invalidated (password reset) or expired: sign in again. */
export const CLOSE_SESSION_ENDED = 4401;
/** The person is no longer a member of the page's notebook (or the page is gone). */
export const CLOSE_ACCESS_REVOKED = 4403;
/**
 * May edit again (promoted, page unlocked) after some of its edits were dropped: reconnect, so the
 * sync step sends the client's state afresh. What it typed meanwhile is merged then, as offline
 * edits are.
 */
export const CLOSE_RESYNC = 4205;
export const CLOSE_STORE_FAILED = 1011;
export const CLOSE_CHECK_FAILED = 1011;
export const CLOSE_SHUTDOWN = 1001;

/** A browser tab's provider has one awareness client id per connection. */
const AWARENESS_IDS_PER_CONNECTION = 1;

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
  /** Which connection introduced each awareness client id (only it may change that entry). */
  private readonly awarenessOwners = new Map<number, Connection>();
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
    this.awareness.on('update', (changes: AwarenessChanges) => this.relayAwareness(changes));
    this.announce();
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
    try {
      await room.run(() => room.writeFirstParagraph());
    } catch (error) {
      await room.unload(true);
      throw error;
    }
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

  /** Adds a connection; `checkedAt` is when the grant was decided (a refresh since then rechecks it). */
  join(ws: WebSocket, grant: ConnectionGrant, checkedAt: number): Connection {
    const conn: Connection = {
      ...grant,
      ws,
      awarenessIds: new Set(),
      alive: true,
      checkedAt,
      pendingChecks: 0,
      lastCheck: Promise.resolve(),
      held: [],
      diverged: false,
      closed: false,
    };
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
    this.announce();
    return conn;
  }

  /**
   * Checks again, from the database, the session and membership behind the chosen connections
   * (after a membership, role or sign-out change): each keeps its rights, becomes read-only or
   * writable, or is closed (4401 session ended, 4403 no longer a member).
   */
  async refreshAccess(which: (conn: Connection) => boolean): Promise<void> {
    await Promise.all([...this.conns.values()].filter(which).map((conn) => this.checkAccess(conn)));
  }

  /** From now on updates are dropped (locked) or accepted again; connected clients are told. */
  async setLocked(locked: boolean): Promise<void> {
    this.locked = locked;
    this.announce();
    // Updates accepted before the lock are still stored; a sign-off closes the editing sessions.
    await this.flush();
    if (locked) await this.run(() => this.endSessions());
    else {
      // Whoever typed into the locked page catches up from a fresh sync (see CLOSE_RESYNC).
      for (const conn of this.conns.values()) if (conn.canWrite && conn.diverged) this.disconnect(conn, CLOSE_RESYNC, 'the page can be edited again; reconnect to catch up');
      // A page signed before it ever had content gets its first paragraph once it can be edited.
      await this.run(() => this.writeFirstParagraph());
    }
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
    if (conn.closed) return;
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
        this.receiveAwareness(conn, message.update);
        break;
      case 'query-awareness':
        this.send(conn, awarenessMessage(this.awareness, [...this.awareness.getStates().keys()]));
        break;
    }
  }

  private receiveUpdate(conn: Connection, update: Uint8Array): void {
    // While the connection's rights are being checked, its changes wait for the verdict.
    if (conn.pendingChecks > 0) {
      conn.held.push(update);
      return;
    }
    if (conn.canWrite && Date.now() - conn.checkedAt >= this.timings.accessCheckMs) {
      conn.held.push(update);
      void this.checkAccess(conn);
      return;
    }
    this.acceptUpdate(conn, update);
  }

  private acceptUpdate(conn: Connection, update: Uint8Array): void {
    let kind: 'changes' | 'empty';
    try {
      kind = inspectUpdate(update);
    } catch {
      conn.ws.close(CLOSE_MALFORMED, 'malformed update');
      return;
    }
    if (kind === 'empty') return;
    // Readers, organisation viewers and locked pages: the change is dropped, never stored or relayed.
    if (!conn.canWrite || this.locked || this.unloading) {
      conn.diverged = true;
      return;
    }
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

  /** Runs the access checks of a connection one after another; held updates wait for the last. */
  private checkAccess(conn: Connection): Promise<void> {
    conn.pendingChecks += 1;
    const check = conn.lastCheck
      .then(async () => {
        if (conn.closed) return;
        const startedAt = Date.now();
        let verdict: AccessVerdict | null;
        try {
          verdict = await checkConnectionAccess(this.db, conn.sessionId, this.pageId);
        } catch (error) {
          logFailure('checking access')(error);
          verdict = null;
        }
        this.applyVerdict(conn, verdict, startedAt);
      })
      .finally(() => {
        conn.pendingChecks -= 1;
        if (conn.pendingChecks === 0) this.releaseHeld(conn);
      });
    conn.lastCheck = check;
    return check;
  }

  /** `null`: the check itself failed, so the connection cannot be vouched for; it may reconnect. */
  private applyVerdict(conn: Connection, verdict: AccessVerdict | null, checkedAt: number): void {
    if (conn.closed) return;
    if (verdict?.kind === 'open') {
      conn.checkedAt = checkedAt;
      if (verdict.canWrite && !conn.canWrite && conn.diverged) {
        this.disconnect(conn, CLOSE_RESYNC, 'you may edit again; reconnect to catch up');
        return;
      }
      conn.canWrite = verdict.canWrite;
      if (!conn.canWrite) this.dropQueued(conn);
      this.announce();
      return;
    }
    if (!verdict) this.disconnect(conn, CLOSE_CHECK_FAILED, 'could not check access; reconnect');
    else if (verdict.kind === 'session-ended') this.disconnect(conn, CLOSE_SESSION_ENDED, 'session ended; sign in again');
    else this.disconnect(conn, CLOSE_ACCESS_REVOKED, 'no longer a member of this notebook');
  }

  private releaseHeld(conn: Connection): void {
    const held = conn.held.splice(0);
    for (const update of held) if (!conn.closed) this.acceptUpdate(conn, update);
  }

  /** Updates of a connection that lost write access, not yet stored: never acknowledged, so dropped. */
  private dropQueued(conn: Connection): void {
    const before = this.queue.length;
    this.queue = this.queue.filter((entry) => entry.conn !== conn);
    if (this.queue.length < before) conn.diverged = true;
  }

  private disconnect(conn: Connection, code: number, reason: string): void {
    conn.closed = true;
    conn.canWrite = false;
    conn.held = [];
    this.dropQueued(conn);
    conn.ws.close(code, reason);
    this.announce();
  }

  /**
   * Presence is set only for the entry a connection introduced itself with: never the server's
   * own (the lock) and never another connection's, so nobody can rewrite or remove someone
   * else's cursor or name. Clients also echo the entries they receive; those are dropped here.
   */
  private receiveAwareness(conn: Connection, update: Uint8Array): void {
    let own;
    try {
      own = decodeAwarenessEntries(update).filter((entry) => this.mayAnnounce(conn, entry));
    } catch {
      conn.ws.close(CLOSE_MALFORMED, 'malformed awareness update');
      return;
    }
    if (own.length > 0) {
      const named = own.map((entry) => withSignedInName(entry, conn.user.name));
      awarenessProtocol.applyAwarenessUpdate(this.awareness, encodeAwarenessEntries(named), conn);
    }
  }

  /**
   * An id nobody holds becomes the connection's when it announces a state for it (not a removal).
   * The same person's new connection takes over their entry, with a newer state than the server
   * has (an echo is not newer), from an old one that has not noticed yet that it is gone (a
   * reconnect after a network drop).
   */
  private mayAnnounce(conn: Connection, { clientId, clock, removed }: AwarenessEntry): boolean {
    if (clientId === this.awareness.clientID) return false;
    const owner = this.awarenessOwners.get(clientId);
    if (owner === conn) return true;
    if (removed || conn.awarenessIds.size >= AWARENESS_IDS_PER_CONNECTION) return false;
    if (owner && (owner.user.id !== conn.user.id || clock <= (this.awareness.meta.get(clientId)?.clock ?? 0))) return false;
    owner?.awarenessIds.delete(clientId);
    this.awarenessOwners.set(clientId, conn);
    conn.awarenessIds.add(clientId);
    return true;
  }

  private relayAwareness({ added, updated, removed }: AwarenessChanges): void {
    const message = awarenessMessage(this.awareness, [...added, ...updated, ...removed]);
    for (const other of this.conns.values()) this.send(other, message);
  }

  /** Sets the server's entry when the lock or anyone's write access changed (else nothing is sent). */
  private announce(): void {
    const readOnly = new Set<string>();
    for (const conn of this.conns.values()) if (!conn.closed && !conn.canWrite) readOnly.add(conn.user.id);
    const state: ServerAwarenessState = { page: { locked: this.locked }, readOnlyUsers: [...readOnly].sort() };
    if (JSON.stringify(state) === JSON.stringify(this.awareness.getLocalState())) return;
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
    conn.closed = true;
    for (const id of conn.awarenessIds) this.awarenessOwners.delete(id);
    awarenessProtocol.removeAwarenessStates(this.awareness, [...conn.awarenessIds], null);
    this.announce();
    this.scheduleUnload();
  }

  private tick(): void {
    const now = Date.now();
    for (const conn of this.conns.values()) {
      if (!conn.alive) {
        conn.ws.terminate();
        continue;
      }
      conn.alive = false;
      conn.ws.ping();
      // Catches sessions that expired or ended without a refresh (and readers, who send no updates).
      if (conn.pendingChecks === 0 && now - conn.checkedAt >= this.timings.accessCheckMs) void this.checkAccess(conn);
    }
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

  /**
   * A page with nothing stored gets its first paragraph from the server, stored like any update
   * and applied before anyone receives the document (see firstParagraph.ts). Locked pages stay
   * as they are until they can be edited again.
   */
  private async writeFirstParagraph(): Promise<void> {
    if (this.locked || this.doc.store.clients.size > 0) return;
    const update = firstParagraphUpdate();
    this.lastUpdateId = await appendFirstUpdate(this.db, this.pageId, update);
    this.uncompacted += 1;
    Y.applyUpdate(this.doc, update, null);
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

/**
 * The name shown beside a cursor (the editor's `name` field) is the signed-in person's, whatever
 * the client claimed: presence must not let anyone appear as someone else.
 */
function withSignedInName(entry: AwarenessEntry, name: string): AwarenessEntry {
  if (entry.removed) return entry;
  const state = JSON.parse(entry.state) as unknown;
  if (typeof state !== 'object' || state === null || !('name' in state)) return entry;
  return { ...entry, state: JSON.stringify({ ...state, name }) };
}
