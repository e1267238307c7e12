import { useEffect, useReducer, useState } from 'react';
import type { WebsocketProvider } from 'y-websocket';
import { connectionPhase, connectionReducer, initialConnection, type ConnectionPhase } from './connectionState';

export interface PresentPerson {
  userId: string;
  name: string;
  colour: string;
  self: boolean;
}

interface AwarenessEntry {
  name?: unknown;
  color?: unknown;
  awarenessData?: { userId?: unknown };
  /** Announced by the server itself (ServerAwarenessState in server/collab/room.ts). */
  page?: { locked?: unknown };
  readOnlyUsers?: unknown;
}

export interface CollabStatus {
  phase: ConnectionPhase;
  people: PresentPerson[];
  locked: boolean;
  /** Whether the server holds `userId`'s connection read-only; null until the server has said. */
  readOnly: boolean | null;
}

/** Connection phase, who is on the page, whether the server has locked it and may take my edits. */
export function useCollabStatus(provider: WebsocketProvider | null, userId: string): CollabStatus {
  const [connection, dispatch] = useReducer(connectionReducer, initialConnection);
  const [people, setPeople] = useState<PresentPerson[]>([]);
  const [locked, setLocked] = useState(false);
  const [readOnly, setReadOnly] = useState<boolean | null>(null);

  useEffect(() => {
    if (!provider) return;
    const onStatus = ({ status }: { status: 'connected' | 'disconnected' | 'connecting' }) => dispatch({ type: 'status', status });
    const onSync = (synced: boolean) => dispatch({ type: 'synced', synced });
    const onClosed = () => dispatch({ type: 'closed' });
    const onUpdate = (_update: Uint8Array, origin: unknown) => origin !== provider && dispatch({ type: 'local-edit' });
    const onAwareness = () => {
      const seen = new Map<string, PresentPerson>();
      let serverLock = false;
      let serverReadOnly: boolean | null = null;
      for (const [clientId, raw] of provider.awareness.getStates()) {
        const state = raw as AwarenessEntry;
        if (state.page) {
          if (state.page.locked === true) serverLock = true;
          if (Array.isArray(state.readOnlyUsers)) serverReadOnly = state.readOnlyUsers.includes(userId);
        }
        const personId = state.awarenessData?.userId;
        if (typeof personId !== 'string' || typeof state.name !== 'string') continue;
        const self = clientId === provider.awareness.clientID;
        if (!seen.has(personId) || self) seen.set(personId, { userId: personId, name: state.name, colour: String(state.color), self });
      }
      setPeople([...seen.values()].sort((a, b) => Number(b.self) - Number(a.self) || a.name.localeCompare(b.name)));
      setLocked(serverLock);
      setReadOnly(serverReadOnly);
    };
    provider.on('status', onStatus);
    provider.on('sync', onSync);
    provider.on('closed', onClosed);
    provider.doc.on('update', onUpdate);
    provider.awareness.on('change', onAwareness);
    onAwareness();
    return () => {
      provider.off('status', onStatus);
      provider.off('sync', onSync);
      provider.off('closed', onClosed);
      provider.doc.off('update', onUpdate);
      provider.awareness.off('change', onAwareness);
    };
  }, [provider, userId]);

  return { phase: connectionPhase(connection), people, locked, readOnly };
}
