import type { EstimateAnswerRequest, PublicEstimateDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { publicEstimateQueryKey } from './get-public-estimate';

export interface AnswerEstimateInput {
  token: string;
  data: EstimateAnswerRequest;
}

/** `POST /api/public/estimates/:token/answers` (no account): approve or decline one stage; every answer is kept. */
export function answerPublicEstimate({ token, data }: AnswerEstimateInput): Promise<PublicEstimateDto> {
  return api.post<PublicEstimateDto>(`/public/estimates/${encodeURIComponent(token)}/answers`, data, { signOutOnUnauthorized: false });
}

type UseAnswerEstimateOptions = { mutationConfig?: MutationConfig<typeof answerPublicEstimate> };

export function useAnswerPublicEstimate({ mutationConfig }: UseAnswerEstimateOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: answerPublicEstimate,
    onSuccess: (...args) => {
      queryClient.setQueryData(publicEstimateQueryKey(args[1].token), args[0]);
      return onSuccess?.(...args);
    },
  });
}
