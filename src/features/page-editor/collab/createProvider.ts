import type { Provider } from '@lexical/yjs';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';

/** The collaboration endpoint on the same origin as the app; the session cookie authenticates it. */
export function collabServerUrl(location: Location = window.location): string {
  return `${location.protocol === 'https:' ? 'wss:' : 'ws:'}//${location.host}/collab`;
}

/**
 * The provider for one page's shared document. It does not connect by itself: the collaboration
 * plugin connects it once the editor binding exists. Cross-tab messaging is off so that every
 * change passes the server, which decides who may write.
 */
export function createPageProvider(pageId: string, docs: Map<string, Y.Doc>): WebsocketProvider {
  let doc = docs.get(pageId);
  if (!doc) {
    doc = new Y.Doc();
    docs.set(pageId, doc);
  } else {
    // A remount (e.g. React's development double render) reuses the document kept in the map.
    doc.load();
  }
  return new WebsocketProvider(collabServerUrl(), pageId, doc, { connect: false, disableBc: true });
}

/** @lexical/yjs types its provider loosely; y-websocket's satisfies it at runtime. */
export function asLexicalProvider(provider: WebsocketProvider): Provider {
  return provider as unknown as Provider;
}
