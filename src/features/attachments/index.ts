export { AttachmentsPanel } from './components/AttachmentsPanel';
export type { AttachmentRenderers } from './components/AttachmentItem';
