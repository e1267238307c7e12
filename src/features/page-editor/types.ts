import type { ReactNode } from 'react';
import type { StructureFields } from '../../../shared/editor';

/** A structure an embed is tied to, as the embed's renderer receives it. */
export type LinkedStructure = StructureFields;

/**
 * Bodies of embedded blocks, supplied by the route from other features (features never import
 * each other). Missing renderers leave a plain placeholder naming the attachment.
 */
export interface EmbedRenderers {
  attachment?: (props: { attachmentId: string; linkedStructure: LinkedStructure | null }) => ReactNode;
}

export interface EditorUser {
  id: string;
  name: string;
}
