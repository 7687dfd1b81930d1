import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ImagePickerAsset } from 'expo-image-picker';
import { request } from '@/hooks/api/request';
import { photoFormData } from '@/hooks/api/use-photos';
import { siteKeys } from '@/hooks/api/use-sites';
import type { PlantRoomInput } from '@/shared/schemas/register';
import type { Photo, PlantRoom } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/api';

export const plantRoomKeys = {
  all: ['plant-rooms'] as const,
  forSite: (siteId: number) => [...plantRoomKeys.all, 'site', siteId] as const,
  detail: (id: number) => [...plantRoomKeys.all, 'detail', id] as const,
};

export function useSitePlantRoomsQuery(siteId: number | null) {
  return useQuery({
    queryKey: plantRoomKeys.forSite(siteId ?? 0),
    queryFn: () => request<ListResponse<PlantRoom>>(`/sites/${siteId}/plant-rooms?pageSize=200`),
    enabled: !!siteId && siteId > 0,
  });
}

export function usePlantRoomQuery(id: number) {
  return useQuery({ queryKey: plantRoomKeys.detail(id), queryFn: () => request<PlantRoom>(`/plant-rooms/${id}`), enabled: id > 0 });
}

export function useCreatePlantRoomMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: PlantRoomInput) => request<PlantRoom>('/plant-rooms', { method: 'POST', body: input }),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: plantRoomKeys.all });
      await qc.invalidateQueries({ queryKey: siteKeys.all });
    },
  });
}

export function useUpdatePlantRoomMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<PlantRoomInput>) => request<PlantRoom>(`/plant-rooms/${id}`, { method: 'PATCH', body: input }),
    onSuccess: (room) => {
      qc.setQueryData(plantRoomKeys.detail(id), room);
      return qc.invalidateQueries({ queryKey: plantRoomKeys.all });
    },
  });
}

export function useAddPlantRoomPhotoMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (asset: ImagePickerAsset) => request<Photo>(`/plant-rooms/${id}/photos`, { method: 'POST', body: photoFormData(asset) }),
    onSuccess: () => qc.invalidateQueries({ queryKey: plantRoomKeys.detail(id) }),
  });
}
