import { ObservableV2 } from 'lib0/observable';
import { Awareness } from 'y-protocols/awareness';
import * as Y from 'yjs';

type Events = {
  sync: (synced: boolean) => void;
  status: (event: { status: string }) => void;
  update: (update: unknown) => void;
  reload: (doc: Y.Doc) => void;
};

/**
 * A provider for one stored history snapshot, without any network: "connecting" applies the
 * snapshot's Yjs state to the (fresh) document, which the collaboration binding then renders.
 * Nothing is ever sent anywhere, so an old version can be read but never written back.
 */
export class SnapshotProvider extends ObservableV2<Events> {
  readonly awareness: Awareness;
  private applied = false;

  constructor(
    private readonly doc: Y.Doc,
    private readonly state: Uint8Array,
  ) {
    super();
    this.awareness = new Awareness(doc);
  }

  connect(): void {
    if (!this.applied) {
      this.applied = true;
      Y.applyUpdate(this.doc, this.state, this);
    }
    this.emit('status', [{ status: 'connected' }]);
    this.emit('sync', [true]);
  }

  disconnect(): void {
    this.awareness.destroy();
  }
}

export function decodeBase64(text: string): Uint8Array {
  return Uint8Array.from(atob(text), (char) => char.charCodeAt(0));
}
