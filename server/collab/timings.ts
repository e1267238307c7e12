/** How often the collaboration server does its background work; tests shorten these. */
export interface CollabTimings {
  /** The projection (page_content, pages.updatedAt) is rebuilt this long after the last change ... */
  projectionDelayMs: number;
  /** ... but never later than this after the first unprojected change. */
  projectionMaxDelayMs: number;
  /** A history snapshot is taken once this long has passed since the first edit after the last one. */
  snapshotEveryMs: number;
  /** Appended updates are folded into the page's state row once this many have piled up. */
  compactAfterUpdates: number;
  /** An editing session ends after this long without an update from its author. */
  sessionIdleMs: number;
  /** A page nobody is connected to stays in memory this long (quick reconnects stay cheap). */
  unloadAfterMs: number;
  /** Period of the room's housekeeping (idle sessions, activity snapshots) and of websocket pings. */
  tickMs: number;
  /**
   * A connection's session and membership are checked again once this long has passed since the
   * last check: at the next housekeeping tick, or before its next update is accepted.
   */
  accessCheckMs: number;
}

export const defaultTimings: CollabTimings = {
  projectionDelayMs: 1_000,
  projectionMaxDelayMs: 5_000,
  snapshotEveryMs: 5 * 60_000,
  compactAfterUpdates: 500,
  sessionIdleMs: 10 * 60_000,
  unloadAfterMs: 30_000,
  tickMs: 30_000,
  accessCheckMs: 60_000,
};
