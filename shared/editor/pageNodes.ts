import { LinkNode } from '@lexical/link';
import { ListItemNode, ListNode } from '@lexical/list';
import { HeadingNode, QuoteNode } from '@lexical/rich-text';
import { TableCellNode, TableNode, TableRowNode } from '@lexical/table';
import type { Klass, LexicalNode } from 'lexical';
import { AttachmentEmbedNode } from './attachmentEmbedNode';
import { ReagentsNode } from './reagentsNode';
import { StructureNode } from './structureNode';

/**
 * Every node type a page can hold. The browser editor registers the same list with the
 * block nodes swapped for their rendering subclasses (same types, same fields); a headless editor
 * on the server registers this list as it is to read a page's Yjs document.
 */
export const textNodes: Klass<LexicalNode>[] = [HeadingNode, QuoteNode, ListNode, ListItemNode, TableNode, TableRowNode, TableCellNode, LinkNode];

export const pageNodes: Klass<LexicalNode>[] = [...textNodes, StructureNode, AttachmentEmbedNode, ReagentsNode];
