import { useQuery } from '@tanstack/react-query';
import type { AttachmentSummary } from '../../../../shared/schemas';
import type { NameStyle } from '../../../../shared/chem';
import { api } from '../../../lib/api';
import { describeInput, describeMolfile } from '../structure/chemistry';

export interface SnapshotSummary {
  id: string;
  takenAt: string;
  reason: string;
  authors: { id: string; name: string }[];
}

export interface SnapshotState {
  id: string;
  takenAt: string;
  reason: string;
  /** The whole Yjs document at that moment, base64. */
  update: string;
}

export const editorKeys = {
  history: (pageId: string) => ['pages', pageId, 'history'] as const,
  snapshot: (pageId: string, snapshotId: string) => ['pages', pageId, 'history', snapshotId] as const,
  attachments: (pageId: string) => ['pages', pageId, 'attachments'] as const,
  description: (molfile: string, style: NameStyle) => ['structure-description', style, molfile] as const,
  smilesDescription: (smiles: string) => ['smiles-description', smiles] as const,
};

export function usePageHistory(pageId: string, enabled: boolean) {
  return useQuery({
    queryKey: editorKeys.history(pageId),
    queryFn: () => api.get<SnapshotSummary[]>(`/api/pages/${encodeURIComponent(pageId)}/history`),
    enabled,
  });
}

export function useSnapshot(pageId: string, snapshotId: string) {
  return useQuery({
    queryKey: editorKeys.snapshot(pageId, snapshotId),
    queryFn: () => api.get<SnapshotState>(`/api/pages/${encodeURIComponent(pageId)}/history/${encodeURIComponent(snapshotId)}`),
    // A snapshot never changes once taken.
    staleTime: Infinity,
  });
}

export function usePageAttachments(pageId: string) {
  return useQuery({
    queryKey: editorKeys.attachments(pageId),
    queryFn: () => api.get<AttachmentSummary[]>(`/api/pages/${encodeURIComponent(pageId)}/attachments`),
  });
}

/**
 * Name, formula and masses of a structure, computed in the browser by the naming engine. Cached
 * by molfile and style, so the block and the side panel share one computation, and every
 * participant recomputes as soon as the molfile changes in the shared document.
 */
export function useStructureDescription(molfile: string, style: NameStyle) {
  return useQuery({
    queryKey: editorKeys.description(molfile, style),
    queryFn: () => describeMolfile(molfile, style),
    enabled: molfile !== '',
    staleTime: Infinity,
    retry: false,
  });
}

/** Name, formula and molar mass of a reagent's SMILES (preferred names), computed in the browser. */
export function useSmilesDescription(smiles: string) {
  return useQuery({
    queryKey: editorKeys.smilesDescription(smiles),
    queryFn: () => describeInput({ smiles }),
    enabled: smiles !== '',
    staleTime: Infinity,
    retry: false,
  });
}
