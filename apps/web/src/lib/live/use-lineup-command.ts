import { type MutateOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { LineupCommandResult, LineupSnapshot } from '@catline/contracts';
import { lineupKeys } from './lineup-keys.js';
import { liveCycles } from './live-cycles.js';

interface LineupCommandOptions<TVariables> {
  cycleId: number;
  send: (variables: TVariables) => Promise<LineupCommandResult>;
  /** What the lineup looks like if the server agrees; shown at once, undone if it refuses. */
  optimistic?: (snapshot: LineupSnapshot, variables: TVariables) => LineupSnapshot;
}

/** A command whose request has already left, and what it asked. */
interface SentCommand<TVariables> {
  readonly variables: TVariables;
  readonly answer: Promise<LineupCommandResult>;
}

/**
 * A command on a cycle's lineup. The server answers with the accepted change, which goes through the live
 * feed like any broadcast (so it is applied once, in order) instead of a refetch. On refusal the optimistic
 * view is rolled back and the snapshot refetched, so the screen shows what the server holds.
 *
 * The request leaves in the gesture that asked for it, before React draws anything for it: drawing a
 * 40-card board on a busy tablet takes longer than the server's answer, and every other screen waits for
 * the request, not for the drawing (the bench's drop seen on one other page: p50 355 -> 214 ms).
 */
export function useLineupCommand<TVariables>({ cycleId, send, optimistic }: LineupCommandOptions<TVariables>) {
  const queryClient = useQueryClient();
  const key = lineupKeys.snapshot(cycleId);
  const mutation = useMutation({
    mutationFn: (command: SentCommand<TVariables>) => command.answer,
    onMutate: async ({ variables }) => {
      if (!optimistic) return { previous: undefined };
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<LineupSnapshot>(key);
      if (previous) queryClient.setQueryData(key, optimistic(previous, variables));
      return { previous };
    },
    onSuccess: (result) => liveCycles.receive(result.change),
    onError: (_error, _command, context) => {
      const current = queryClient.getQueryData<LineupSnapshot>(key);
      // Only undo our own guess: if other changes arrived meanwhile, the refetch below settles it.
      if (context?.previous && current?.version === context.previous.version) {
        queryClient.setQueryData(key, context.previous);
      }
      void queryClient.invalidateQueries({ queryKey: key });
    },
  });
  const mutate = (
    variables: TVariables,
    options?: MutateOptions<LineupCommandResult, Error, SentCommand<TVariables>, { previous?: LineupSnapshot }>,
  ) => {
    const answer = send(variables);
    // A refusal is the mutation's to handle, once it takes the answer up a few ticks later.
    answer.catch(() => undefined);
    mutation.mutate({ variables, answer }, options);
  };
  return { ...mutation, mutate };
}
