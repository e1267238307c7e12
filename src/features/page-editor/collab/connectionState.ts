/**
 * What the page tells its editor about the connection, derived from the websocket provider's
 * events and the document's local changes. Pure, so the transitions are unit-tested.
 */
export type ConnectionPhase = 'connecting' | 'live' | 'reconnecting' | 'offline-with-edits' | 'closed';

export interface ConnectionState {
  socket: 'connecting' | 'connected' | 'disconnected';
  everSynced: boolean;
  synced: boolean;
  /** Local edits made while not connected, not yet merged back. */
  unsentEdits: boolean;
  /** The server ended the connection for good (e.g. access removed). */
  closed: boolean;
}

export type ConnectionEvent =
  | { type: 'status'; status: ConnectionState['socket'] }
  | { type: 'synced'; synced: boolean }
  | { type: 'local-edit' }
  | { type: 'closed' };

export const initialConnection: ConnectionState = { socket: 'connecting', everSynced: false, synced: false, unsentEdits: false, closed: false };

export function connectionReducer(state: ConnectionState, event: ConnectionEvent): ConnectionState {
  switch (event.type) {
    case 'status':
      return { ...state, socket: event.status, synced: event.status === 'connected' ? state.synced : false };
    case 'synced':
      // The exchange after (re)connecting carries both sides' missing changes: edits made offline are merged.
      return event.synced
        ? { ...state, synced: true, everSynced: true, unsentEdits: false }
        : { ...state, synced: false };
    case 'local-edit':
      return state.socket === 'connected' && state.synced ? state : { ...state, unsentEdits: true };
    case 'closed':
      return { ...state, closed: true, socket: 'disconnected', synced: false };
  }
}

export function connectionPhase(state: ConnectionState): ConnectionPhase {
  if (state.closed) return state.unsentEdits ? 'offline-with-edits' : 'closed';
  if (state.socket === 'connected' && state.synced) return 'live';
  if (state.unsentEdits) return 'offline-with-edits';
  return state.everSynced ? 'reconnecting' : 'connecting';
}
