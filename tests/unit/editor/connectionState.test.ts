import { describe, expect, it } from 'vitest';
import {
  connectionPhase,
  connectionReducer,
  initialConnection,
  type ConnectionEvent,
} from '../../../src/features/page-editor/collab/connectionState';

const run = (...events: ConnectionEvent[]) => events.reduce(connectionReducer, initialConnection);

describe('connection phase shown above the page', () => {
  it('is connecting until the first sync, then live', () => {
    expect(connectionPhase(run())).toBe('connecting');
    expect(connectionPhase(run({ type: 'status', status: 'connected' }))).toBe('connecting');
    expect(connectionPhase(run({ type: 'status', status: 'connected' }, { type: 'synced', synced: true }))).toBe('live');
  });

  it('says reconnecting after a drop, and offline-with-edits once something is typed meanwhile', () => {
    const dropped = run({ type: 'status', status: 'connected' }, { type: 'synced', synced: true }, { type: 'status', status: 'disconnected' });
    expect(connectionPhase(dropped)).toBe('reconnecting');
    const typed = connectionReducer(dropped, { type: 'local-edit' });
    expect(connectionPhase(typed)).toBe('offline-with-edits');
    // Still offline while the socket is retrying.
    expect(connectionPhase(connectionReducer(typed, { type: 'status', status: 'connecting' }))).toBe('offline-with-edits');
  });

  it('is live again once the sync after reconnecting has merged the offline edits', () => {
    const offline = run(
      { type: 'status', status: 'connected' },
      { type: 'synced', synced: true },
      { type: 'status', status: 'disconnected' },
      { type: 'local-edit' },
      { type: 'status', status: 'connected' },
    );
    expect(connectionPhase(offline)).toBe('offline-with-edits');
    expect(connectionPhase(connectionReducer(offline, { type: 'synced', synced: true }))).toBe('live');
  });

  it('ignores local edits while live and reports a connection the server ended', () => {
    const live = run({ type: 'status', status: 'connected' }, { type: 'synced', synced: true }, { type: 'local-edit' });
    expect(live.unsentEdits).toBe(false);
    expect(connectionPhase(connectionReducer(live, { type: 'closed' }))).toBe('closed');
  });
});
