import type { Klass, LexicalNode } from 'lexical';
import { textNodes } from '../../../../shared/editor';
import { AttachmentEmbedBlockNode } from './AttachmentEmbedBlockNode';
import { ReagentsBlockNode } from './ReagentsBlockNode';
import { StructureBlockNode } from './StructureBlockNode';

/** shared/editor's page nodes with the blocks in their rendering form. */
export const editorNodes: Klass<LexicalNode>[] = [...textNodes, StructureBlockNode, AttachmentEmbedBlockNode, ReagentsBlockNode];
