import type { MethodSummary } from '@limitbook/contracts';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { blockRequest, evaluateBatch, seedEvaluations, type CalculatorBlockConfig } from '@/components/calculator';

/**
 * Evaluates every calculator block of a page revision in one request and hands each answer to
 * its block's own evaluation, so the page asks the server once on load and then only per change.
 */
export function usePageEvaluations(revisionId: string | undefined, blocks: CalculatorBlockConfig[], methodById: (id: string) => MethodSummary | undefined, catalogReady: boolean) {
  const queryClient = useQueryClient();
  const evaluable = blocks.filter((block) => methodById(block.method));
  const query = useQuery({
    queryKey: ['page-evaluations', revisionId],
    queryFn: async ({ signal }) => {
      const requests = evaluable.map((block) => blockRequest(block, methodById(block.method)));
      if (requests.length === 0) return { evaluated: 0 };
      const outcomes = await evaluateBatch(requests, signal);
      seedEvaluations(queryClient, requests, outcomes);
      return { evaluated: outcomes.length };
    },
    enabled: !!revisionId && catalogReady,
    staleTime: Infinity,
    retry: false,
  });
  // Once the batch has answered (or failed, in which case each block asks on its own), blocks take over.
  return { settled: query.isSuccess || query.isError };
}
