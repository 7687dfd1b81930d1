import { useMutation } from '@tanstack/react-query';
import { fetchBlob } from '@/hooks/api/request';

export type LabelLayout = 'sheet' | 'roll';
export interface LabelPdfSelection {
  assetIds?: number[];
  plantRoomId?: number;
  siteId?: number;
}

export function labelPdfPath(selection: LabelPdfSelection, layout: LabelLayout) {
  const params = new URLSearchParams({ layout });
  if (selection.assetIds?.length) params.set('assetIds', selection.assetIds.join(','));
  else if (selection.plantRoomId) params.set('plantRoomId', String(selection.plantRoomId));
  else if (selection.siteId) params.set('siteId', String(selection.siteId));
  return `/api/labels.pdf?${params.toString()}`;
}

/** Downloads a label PDF (A4 sheet of 21, or one per page for a 62 mm roll printer). */
export function useLabelPdfMutation() {
  return useMutation({
    mutationFn: ({ selection, layout }: { selection: LabelPdfSelection; layout: LabelLayout }) => fetchBlob(labelPdfPath(selection, layout)),
  });
}
