import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { assemblyKeys } from './assembly-keys';
import type { AssemblyWithCautions } from './get-assembly';
import { lookupKeys } from './lookup-keys';

/** What every lifecycle action answers: the assembly as it is now, and the cautions for removal-type actions. */
export interface LifecycleAnswer {
  data: AssemblyDto;
  cautions?: string[];
}

/** Puts the answered assembly in the cache and refreshes what the action changed: its history, lists and positions. */
export function applyLifecycleAnswer(queryClient: QueryClient, answer: LifecycleAnswer, alsoChanged: string[] = []): void {
  const assembly = answer.data;
  queryClient.setQueryData<AssemblyWithCautions>(assemblyKeys.detail(assembly.id), (previous) => ({
    assembly,
    cautions: answer.cautions ?? previous?.cautions ?? [],
  }));
  void queryClient.invalidateQueries({ queryKey: assemblyKeys.events(assembly.id) });
  for (const id of alsoChanged) void queryClient.invalidateQueries({ queryKey: assemblyKeys.detail(id) });
  void queryClient.invalidateQueries({ queryKey: assemblyKeys.lists() });
  void queryClient.invalidateQueries({ queryKey: lookupKeys.positions.all });
}

export interface LifecycleOptions<V> {
  onSuccess?: (answer: LifecycleAnswer, variables: V) => void;
  /** Other assemblies the action changed, whose records are fetched again. */
  alsoChanged?: (variables: V) => string[];
}

/** A mutation of one lifecycle action; `variables` carry the submission key so a retry reuses it. */
export function useLifecycleMutation<V>(action: (variables: V) => Promise<LifecycleAnswer>, { onSuccess, alsoChanged }: LifecycleOptions<V> = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: action,
    onSuccess: (answer, variables) => {
      applyLifecycleAnswer(queryClient, answer, alsoChanged?.(variables) ?? []);
      onSuccess?.(answer, variables);
    },
  });
}
