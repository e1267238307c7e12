export * from './structureNode';
export * from './attachmentEmbedNode';
export * from './pageNodes';
