import { calculationRecordSchema, type CalculationRecord, type CreateRecordRequest } from '@limitbook/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getRecordQueryOptions } from './get-record';

export function createRecord(body: CreateRecordRequest): Promise<CalculationRecord> {
  return api.post('/api/records', body, calculationRecordSchema);
}

/** Saves a block's run; the new record is cached for its permalink and the lists refresh. */
export function useCreateRecord() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRecord,
    onSuccess: (record) => {
      queryClient.setQueryData(getRecordQueryOptions(record.id).queryKey, record);
      return queryClient.invalidateQueries({ queryKey: ['records', 'list'] });
    },
  });
}
