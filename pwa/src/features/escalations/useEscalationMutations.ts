import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../api/ApiClientContext';
import { acknowledgeEscalation, addEscalationNote, closeEscalation, escalationKeys } from './escalationsApi';
import type { AcknowledgeInput, CloseInput } from './types';

/** Acknowledge, close or add a note to one escalation; every outcome reloads the escalations (a 409 shows the latest). */
export function useEscalationMutations(id: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const onSettled = () => queryClient.invalidateQueries({ queryKey: escalationKeys.all });
  return {
    acknowledge: useMutation({ mutationFn: (input: AcknowledgeInput) => acknowledgeEscalation(client, id, input), onSettled }),
    close: useMutation({ mutationFn: (input: CloseInput) => closeEscalation(client, id, input), onSettled }),
    addNote: useMutation({ mutationFn: (text: string) => addEscalationNote(client, id, text), onSettled }),
  };
}
