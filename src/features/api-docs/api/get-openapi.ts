import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api';
import type { OpenApiDocument } from '../lib/openapi';

/** The live description the server generates from its routes' zod schemas. */
export function getOpenApi(signal?: AbortSignal): Promise<OpenApiDocument> {
  return api.get<OpenApiDocument>('/api/openapi.json', { signal });
}

export function useOpenApi() {
  return useQuery(queryOptions({ queryKey: ['openapi'] as const, queryFn: ({ signal }) => getOpenApi(signal), staleTime: 5 * 60_000 }));
}
