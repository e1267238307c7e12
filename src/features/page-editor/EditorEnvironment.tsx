import { createContext, useContext } from 'react';
import type { StructureFields } from '../../../shared/editor';
import type { EmbedRenderers } from './types';

export type StructureDialogRequest =
  | { mode: 'insert'; start: 'text' | 'draw' }
  | { mode: 'redraw'; nodeKey: string; fields: StructureFields };

/** What blocks rendered inside the editor need from the page around them. */
export interface EditorEnvironment {
  pageId: string;
  embedRenderers: EmbedRenderers;
  openStructureDialog: (request: StructureDialogRequest) => void;
  /** Structures of the page by structureKey, for embeds that point at one. */
  structures: ReadonlyMap<string, StructureFields>;
}

export const EditorEnvironmentContext = createContext<EditorEnvironment | null>(null);

export function useEditorEnvironment(): EditorEnvironment {
  const environment = useContext(EditorEnvironmentContext);
  if (!environment) throw new Error('useEditorEnvironment must be used inside the page editor');
  return environment;
}
