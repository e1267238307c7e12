import type { JSX } from 'react';
import type { NodeKey, SerializedPartial } from 'lexical';
import { StructureNode, type SerializedStructureNode, type StructureFields } from '../../../../shared/editor';
import { StructureBlock } from '../structure/StructureBlock';

/** The structure block as the browser shows it; fields and type come from shared/editor. */
export class StructureBlockNode extends StructureNode {
  static getType(): string {
    return StructureNode.getType();
  }

  static clone(node: StructureBlockNode): StructureBlockNode {
    return new StructureBlockNode(node.fields(), node.__key);
  }

  static importJSON(json: SerializedPartial<SerializedStructureNode>): StructureBlockNode {
    return new StructureBlockNode().updateFromJSON(json);
  }

  createDOM(): HTMLElement {
    const element = super.createDOM();
    element.className = 'my-4';
    return element;
  }

  decorate(): JSX.Element {
    return <StructureBlock nodeKey={this.getKey()} fields={this.fields()} />;
  }
}

export function $createStructureBlockNode(fields: Omit<StructureFields, 'structureKey'>, key?: NodeKey): StructureBlockNode {
  return new StructureBlockNode({ ...fields, structureKey: crypto.randomUUID() }, key);
}
