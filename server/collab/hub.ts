import type { Database } from '../db/client';
import type { ProjectedStructure } from '../db/schema';
import { notFound } from '../http/errors';
import { Room } from './room';
import type { CollabTimings } from './timings';

export interface PageContent {
  text: string;
  json: unknown;
  structures: ProjectedStructure[];
}

/**
 * The pages currently open for collaboration, and what other features may ask of them (see
 * INTERFACES.md). A page that nobody has open is loaded for the call and unloaded again later.
 */
export class CollabHub {
  private readonly rooms = new Map<string, Promise<Room | null>>();
  private closing = false;
  /** Counts access refreshes, so an upgrade decided before one can tell it must be decided again. */
  accessEpoch = 0;

  constructor(
    private readonly db: Database,
    readonly timings: CollabTimings,
  ) {}

  /** From now on refuse (locked) or accept updates for the page; connected editors are told. */
  setPageLocked(pageId: string, locked: boolean): Promise<void> {
    return this.withRoom(pageId, (room) => room.setLocked(locked));
  }

  /** Stores what is pending and returns the page's up-to-date projection (text, JSON, structures). */
  currentContent(pageId: string): Promise<PageContent> {
    return this.withRoom(pageId, (room) => room.currentContent());
  }

  /** Records a history snapshot of the page as it is now; returns the snapshot id. */
  takeSnapshot(pageId: string, reason: string): Promise<string> {
    return this.withRoom(pageId, (room) => room.takeSnapshot(reason));
  }

  /**
   * After a change to who may do what (membership removed or changed, organisation role changed,
   * session ended), checks the affected open connections again: those of `userId` (everyone's
   * when omitted) on pages of `notebookId` (every page when omitted). Each becomes read-only or
   * writable as its access now says, or is closed (4401 session ended, 4403 no longer a member).
   * Resolves when every affected connection has been decided; updates they send meanwhile wait.
   */
  async refreshAccess(scope: { notebookId?: string; userId?: string }): Promise<void> {
    this.accessEpoch += 1;
    const rooms = await Promise.all([...this.rooms.values()].map((entry) => entry.catch(() => null)));
    const affected = rooms.filter((room): room is Room => room !== null && (!scope.notebookId || room.notebookId === scope.notebookId));
    await Promise.all(affected.map((room) => room.refreshAccess((conn) => !scope.userId || conn.user.id === scope.userId)));
  }

  /**
   * The loaded room for a page, held until `release()`; throws 404 for a page that does not
   * exist. Waits out a room that is just being unloaded rather than racing it.
   */
  async acquire(pageId: string): Promise<Room> {
    if (this.closing) throw new Error('the collaboration server is shutting down');
    for (;;) {
      let entry = this.rooms.get(pageId);
      if (!entry) entry = this.load(pageId);
      const room = await entry;
      if (!room) throw notFound('Page');
      if (room.hold()) return room;
      await room.unloaded;
    }
  }

  private load(pageId: string): Promise<Room | null> {
    const entry: Promise<Room | null> = Room.load(this.db, pageId, this.timings, () => forget());
    const forget = () => {
      if (this.rooms.get(pageId) === entry) this.rooms.delete(pageId);
    };
    this.rooms.set(pageId, entry);
    entry.then((room) => room ?? forget(), forget);
    return entry;
  }

  async withRoom<T>(pageId: string, use: (room: Room) => Promise<T>): Promise<T> {
    const room = await this.acquire(pageId);
    try {
      return await use(room);
    } finally {
      room.release();
    }
  }

  /** Stores everything pending, disconnects everyone and unloads every page. */
  async close(): Promise<void> {
    this.closing = true;
    const rooms = await Promise.all([...this.rooms.values()].map((entry) => entry.catch(() => null)));
    await Promise.all(rooms.map((room) => room?.shutdown()));
  }
}
