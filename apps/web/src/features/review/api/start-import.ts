import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';
import { importJobSchema } from './get-import-job';

export type ImportTarget = 'draft' | 'in_review';

const startImportResponseSchema = z.object({ job: importJobSchema });

/** Uploads one multi-block JCAMP-DX file; the API answers at once with a job to follow. */
export function useStartImport() {
  return useMutation({
    mutationFn: ({ file, target }: { file: File; target: ImportTarget }) => {
      const form = new FormData();
      form.append('file', file, file.name);
      return apiClient.postForm(`/api/v1/imports?target=${target}`, startImportResponseSchema, form);
    },
  });
}
