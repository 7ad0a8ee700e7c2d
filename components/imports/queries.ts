import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { ImportMapping, ImportPreview, ImportStatus, SavedMapping } from '@/shared/api/receptions';

import { staleTime } from '../query/query-client';
import { receptionKeys } from '../receptions/queries';
import { apiUpload, type UploadProgress } from '../units/api-upload';
import { previewSample } from './sample';

export const importKeys = {
  all: ['reception-imports'] as const,
  list: () => [...importKeys.all, 'list'] as const,
  detail: (id: number) => [...importKeys.all, 'detail', id] as const,
  mappings: () => [...importKeys.all, 'mappings'] as const,
};

/** The mapping goes before the file, so the server knows how to read the rows as they stream in. */
function multipart(file: Blob, fileName: string, mapping?: ImportMapping): FormData {
  const body = new FormData();
  if (mapping) body.append('mapping', JSON.stringify(mapping));
  body.append('file', file, fileName);
  return body;
}

/** Reads the head of the file only: a proposal and a few rows need kilobytes, not the whole upload. */
export function usePreviewImportMutation() {
  return useMutation({
    mutationFn: async ({ file, mapping }: { file: File; mapping?: ImportMapping }) =>
      api<ImportPreview>('/reception-imports/preview', { method: 'POST', body: multipart(await previewSample(file), file.name, mapping) }),
  });
}

/** Uploads the whole file (202 with the job's id once it has arrived); progress reports bytes sent. */
export function useStartImportMutation(onProgress?: (progress: UploadProgress) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, mapping }: { file: File; mapping: ImportMapping }) =>
      apiUpload<{ id: number }>('/reception-imports', multipart(file, file.name, mapping), onProgress),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: importKeys.list() }),
  });
}

const isRunning = (status: ImportStatus | undefined) => status?.status === 'running';

/** One import's progress, polled every second while it runs. */
export function useImportStatusQuery(id: number | null) {
  const queryClient = useQueryClient();
  return useQuery({
    queryKey: importKeys.detail(id ?? 0),
    queryFn: async () => {
      const status = await api<ImportStatus>(`/reception-imports/${id}`);
      // new reports change every results screen and the overview
      if (status.status !== 'running') void queryClient.invalidateQueries({ queryKey: receptionKeys.all });
      return status;
    },
    enabled: id !== null && id > 0,
    refetchInterval: (query) => (isRunning(query.state.data) ? 1000 : false),
  });
}

/** Recent imports, polled while any of them runs (closing the page does not stop a job). */
export function useImportsQuery() {
  return useQuery({
    queryKey: importKeys.list(),
    queryFn: () => api<ImportStatus[]>('/reception-imports'),
    staleTime: staleTime.short,
    refetchInterval: (query) => (query.state.data?.some(isRunning) ? 2000 : false),
  });
}

export function rejectedRowsHref(id: number) {
  return `/api/reception-imports/${id}/rejected.csv`;
}

export function useSavedMappingsQuery() {
  return useQuery({
    queryKey: importKeys.mappings(),
    queryFn: () => api<SavedMapping[]>('/reception-mappings'),
    staleTime: staleTime.normal,
  });
}

export function useSaveMappingMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; mapping: ImportMapping }) =>
      api<SavedMapping>('/reception-mappings', { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: importKeys.mappings() }),
  });
}

export function useDeleteMappingMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/reception-mappings/${id}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: importKeys.mappings() }),
  });
}
