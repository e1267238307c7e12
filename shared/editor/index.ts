export * from './blockNode';
export * from './structureNode';
export * from './attachmentEmbedNode';
export * from './reagentsNode';
export * from './pageNodes';
