import { useMutation } from '@tanstack/react-query';
import { fetchBlob } from '@/hooks/api/request';

import { queryString } from '@/shared/rules/query-string';
import type { LabelLayout } from '@/shared/schemas/queries';

export type { LabelLayout };
export interface LabelPdfSelection {
  assetIds?: number[];
  plantRoomId?: number;
  siteId?: number;
}

function labelPdfPath(selection: LabelPdfSelection, layout: LabelLayout) {
  // One selection only, the narrowest given: items, else a plant room, else a site.
  const { assetIds, plantRoomId, siteId } = selection;
  const narrowest = assetIds?.length ? { assetIds } : plantRoomId ? { plantRoomId } : { siteId };
  return `/api/labels.pdf${queryString({ layout, ...narrowest })}`;
}

/** Downloads a label PDF (A4 sheet of 21, or one per page for a 62 mm roll printer). */
export function useLabelPdfMutation() {
  return useMutation({
    mutationFn: ({ selection, layout }: { selection: LabelPdfSelection; layout: LabelLayout }) => fetchBlob(labelPdfPath(selection, layout)),
  });
}
