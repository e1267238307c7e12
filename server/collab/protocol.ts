import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as awarenessProtocol from 'y-protocols/awareness';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';

/** Message types of the y-websocket wire format (first varUint of every message). */
export const MESSAGE_SYNC = 0;
export const MESSAGE_AWARENESS = 1;
export const MESSAGE_QUERY_AWARENESS = 3;

export type IncomingMessage =
  | { kind: 'sync-step-1'; stateVector: Uint8Array }
  | { kind: 'update'; update: Uint8Array }
  | { kind: 'awareness'; update: Uint8Array }
  | { kind: 'query-awareness' };

/** Decodes one client message; throws on anything malformed. */
export function decodeMessage(data: Uint8Array): IncomingMessage {
  const decoder = decoding.createDecoder(data);
  const type = decoding.readVarUint(decoder);
  switch (type) {
    case MESSAGE_SYNC: {
      const step = decoding.readVarUint(decoder);
      const payload = decoding.readVarUint8Array(decoder);
      if (step === syncProtocol.messageYjsSyncStep1) return { kind: 'sync-step-1', stateVector: payload };
      // Sync step 2 (what the client has that we lacked) and live updates are both changes.
      if (step === syncProtocol.messageYjsSyncStep2 || step === syncProtocol.messageYjsUpdate) return { kind: 'update', update: payload };
      throw new Error(`unknown sync message ${step}`);
    }
    case MESSAGE_AWARENESS:
      return { kind: 'awareness', update: decoding.readVarUint8Array(decoder) };
    case MESSAGE_QUERY_AWARENESS:
      return { kind: 'query-awareness' };
    default:
      throw new Error(`unknown message type ${type}`);
  }
}

/**
 * Whether an update is well formed and changes anything. Decoding parses every struct and the
 * delete set, so garbage is refused before it is stored; an empty one (a client's sync step 2
 * when it had nothing new) is not worth a row.
 */
export function inspectUpdate(update: Uint8Array): 'changes' | 'empty' {
  const decoded = Y.decodeUpdate(update);
  return decoded.structs.length === 0 && decoded.ds.clients.size === 0 ? 'empty' : 'changes';
}

export function syncStep1Message(doc: Y.Doc): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeSyncStep1(encoder, doc);
  return encoding.toUint8Array(encoder);
}

export function syncStep2Message(doc: Y.Doc, stateVector: Uint8Array): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeSyncStep2(encoder, doc, stateVector);
  return encoding.toUint8Array(encoder);
}

export function updateMessage(update: Uint8Array): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeUpdate(encoder, update);
  return encoding.toUint8Array(encoder);
}

export function awarenessMessage(awareness: awarenessProtocol.Awareness, clients: number[]): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_AWARENESS);
  encoding.writeVarUint8Array(encoder, awarenessProtocol.encodeAwarenessUpdate(awareness, clients));
  return encoding.toUint8Array(encoder);
}

/** One client's entry in an awareness update: its presence state as JSON (`null` when it left). */
export interface AwarenessEntry {
  clientId: number;
  clock: number;
  state: string;
  removed: boolean;
}

/** Splits an awareness update into its entries (y-protocols' layout); throws on anything malformed. */
export function decodeAwarenessEntries(update: Uint8Array): AwarenessEntry[] {
  const decoder = decoding.createDecoder(update);
  const count = decoding.readVarUint(decoder);
  const entries: AwarenessEntry[] = [];
  for (let i = 0; i < count; i += 1) {
    const clientId = decoding.readVarUint(decoder);
    const clock = decoding.readVarUint(decoder);
    const state = decoding.readVarString(decoder);
    entries.push({ clientId, clock, state, removed: JSON.parse(state) === null });
  }
  return entries;
}

export function encodeAwarenessEntries(entries: AwarenessEntry[]): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, entries.length);
  for (const { clientId, clock, state } of entries) {
    encoding.writeVarUint(encoder, clientId);
    encoding.writeVarUint(encoder, clock);
    encoding.writeVarString(encoder, state);
  }
  return encoding.toUint8Array(encoder);
}
