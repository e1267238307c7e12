import type { JSX } from 'react';
import type { SerializedPartial } from 'lexical';
import { AttachmentEmbedNode, type AttachmentEmbedFields, type SerializedAttachmentEmbedNode } from '../../../../shared/editor';
import { AttachmentEmbedBlock } from '../embeds/AttachmentEmbedBlock';

/** An attached file inside the text; its body comes from the route's `embedRenderers`. */
export class AttachmentEmbedBlockNode extends AttachmentEmbedNode {
  static getType(): string {
    return AttachmentEmbedNode.getType();
  }

  static clone(node: AttachmentEmbedBlockNode): AttachmentEmbedBlockNode {
    return new AttachmentEmbedBlockNode(node.fields(), node.__key);
  }

  static importJSON(json: SerializedPartial<SerializedAttachmentEmbedNode>): AttachmentEmbedBlockNode {
    return new AttachmentEmbedBlockNode().updateFromJSON(json);
  }

  createDOM(): HTMLElement {
    const element = super.createDOM();
    element.className = 'my-4';
    return element;
  }

  decorate(): JSX.Element {
    return <AttachmentEmbedBlock nodeKey={this.getKey()} fields={this.fields()} />;
  }
}

export function $createAttachmentEmbedBlockNode(fields: AttachmentEmbedFields): AttachmentEmbedBlockNode {
  return new AttachmentEmbedBlockNode(fields);
}
