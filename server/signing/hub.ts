import { getCollabHub } from '../collab';
import type { AppDeps } from '../context';
import type { SigningHub } from './content';

/** The collaboration hub of this server: signing locks pages, reads their content and takes snapshots through it. */
export function signingHub(deps: AppDeps): SigningHub {
  return getCollabHub(deps);
}
