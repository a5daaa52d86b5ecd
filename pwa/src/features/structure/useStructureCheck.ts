import { queryOptions, useQuery } from '@tanstack/react-query';
import { checkStructureInWorker, type StructureInput } from './structureWorkerClient';

/** Query keys of structure checks: the same text and options are computed once. */
export const structureKeys = {
  all: ['structure-check'] as const,
  check: (input: StructureInput) => [...structureKeys.all, input.text, input.tolerance ?? null, input.convention ?? null] as const,
};

/** The structure check of one input, computed in the worker. */
export function structureCheckQuery(input: StructureInput) {
  return queryOptions({
    queryKey: structureKeys.check(input),
    queryFn: () => checkStructureInWorker(input),
    // The computation is local: it must run offline, and a refused structure stays refused.
    networkMode: 'always',
    retry: false,
    staleTime: Infinity,
  });
}

/** The structure check of `input` (nothing runs while it is undefined or empty). */
export function useStructureCheck(input: StructureInput | undefined) {
  const enabled = input !== undefined && input.text.trim() !== '';
  return useQuery({ ...structureCheckQuery(input ?? { text: '' }), enabled });
}
