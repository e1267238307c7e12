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
  /** Announced by the server itself (see server/collab/room.ts). */
  page?: { locked?: unknown };
}

/** Connection phase, who is on the page, and whether the server has locked it. */
export function useCollabStatus(provider: WebsocketProvider | null): { phase: ConnectionPhase; people: PresentPerson[]; locked: boolean } {
  const [connection, dispatch] = useReducer(connectionReducer, initialConnection);
  const [people, setPeople] = useState<PresentPerson[]>([]);
  const [locked, setLocked] = useState(false);

  useEffect(() => {
    if (!provider) return;
    const onStatus = ({ status }: { status: 'connected' | 'disconnected' | 'connecting' }) => dispatch({ type: 'status', status });
    const onSync = (synced: boolean) => dispatch({ type: 'synced', synced });
    const onClosed = () => dispatch({ type: 'closed' });
    const onUpdate = (_update: Uint8Array, origin: unknown) => origin !== provider && dispatch({ type: 'local-edit' });
    const onAwareness = () => {
      const seen = new Map<string, PresentPerson>();
      let serverLock = false;
      for (const [clientId, raw] of provider.awareness.getStates()) {
        const state = raw as AwarenessEntry;
        if (state.page && state.page.locked === true) serverLock = true;
        const userId = state.awarenessData?.userId;
        if (typeof userId !== 'string' || typeof state.name !== 'string') continue;
        const self = clientId === provider.awareness.clientID;
        if (!seen.has(userId) || self) seen.set(userId, { userId, name: state.name, colour: String(state.color), self });
      }
      setPeople([...seen.values()].sort((a, b) => Number(b.self) - Number(a.self) || a.name.localeCompare(b.name)));
      setLocked(serverLock);
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
  }, [provider]);

  return { phase: connectionPhase(connection), people, locked };
}
