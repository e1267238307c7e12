import { $createListItemNode, $createListNode } from '@lexical/list';
import { $createHeadingNode } from '@lexical/rich-text';
import { $createParagraphNode, $createTextNode, $getRoot, type LexicalNode } from 'lexical';
import { randomUUID } from 'node:crypto';
import { Molecule } from 'openchemlib';
import { describe } from '../../shared/chem';
import { AttachmentEmbedNode, ReagentsNode, StructureNode, type ReagentRow } from '../../shared/editor';
import { updateWrittenBy } from '../collab/editorWrite';

/** A page body described block by block, for content written by the server itself (the demo). */
export type PageBlock =
  | { heading: string }
  | { text: string }
  | { steps: string[] }
  | { structure: { smiles: string; label: string } }
  | { reagents: Omit<ReagentRow, 'rowKey'>[] }
  | { attachment: { attachmentId: string; linkedLabel: string | null } };

/**
 * Structure fields as the browser's structure dialog makes them from a SMILES: the naming
 * engine's SMILES and openchemlib's molfile with 2D coordinates.
 */
async function structureFields(smiles: string, label: string) {
  const described = await describe({ smiles });
  return { structureKey: randomUUID(), molfile: Molecule.fromSmiles(smiles).toMolfile(), smiles: described.smiles, label };
}

/**
 * The Yjs state of a page holding these blocks, written the way the browser editor writes it: a
 * Lexical editor with the page's node classes bound to a fresh document through @lexical/yjs, so
 * the page opens in the editor exactly as if someone had typed it.
 */
export async function pageDocumentUpdate(blocks: PageBlock[]): Promise<Uint8Array> {
  const structures = new Map<string, Awaited<ReturnType<typeof structureFields>>>();
  for (const block of blocks) {
    if ('structure' in block) structures.set(block.structure.label, await structureFields(block.structure.smiles, block.structure.label));
  }
  return updateWrittenBy(() => $getRoot().append(...blocks.map((block) => $blockNode(block, structures))));
}

function $blockNode(block: PageBlock, structures: Map<string, { structureKey: string; molfile: string; smiles: string; label: string }>): LexicalNode {
  if ('heading' in block) return $createHeadingNode('h2').append($createTextNode(block.heading));
  if ('text' in block) return $createParagraphNode().append($createTextNode(block.text));
  if ('steps' in block) return $createListNode('number').append(...block.steps.map((step) => $createListItemNode().append($createTextNode(step))));
  if ('structure' in block) return new StructureNode(structures.get(block.structure.label)!);
  if ('reagents' in block) return new ReagentsNode({ rows: block.reagents.map((row) => ({ rowKey: randomUUID(), ...row })) });
  const linked = block.attachment.linkedLabel ? structures.get(block.attachment.linkedLabel)!.structureKey : null;
  return new AttachmentEmbedNode({ attachmentId: block.attachment.attachmentId, linkedStructureKey: linked });
}
