import { useMutation } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import type { IdentifyBody } from '../utils/search-options';
import { identifyResponseSchema, type IdentifyResponse } from './identify-schemas';

export function postIdentify(body: IdentifyBody, signal?: AbortSignal): Promise<IdentifyResponse> {
  return apiClient.post('/api/v1/identify', identifyResponseSchema, { body, signal });
}

/**
 * One search. A mutation rather than a query: each press of Identify is a new question, and the answer
 * belongs to that press (the page keeps it until the next one).
 */
export function useIdentify() {
  return useMutation({ mutationFn: (body: IdentifyBody) => postIdentify(body) });
}
