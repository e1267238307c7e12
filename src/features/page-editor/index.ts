export { PageEditor, type PageEditorProps } from './PageEditor';
export type { EmbedRenderers, LinkedStructure, EditorUser } from './types';
