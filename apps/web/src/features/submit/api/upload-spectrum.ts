import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { apiClient } from '../../../lib/api-client';

/** One spectrum read from an uploaded file, with whatever metadata the file carried. */
export const uploadedBlockSchema = z.object({
  index: z.number().int(),
  title: z.string().nullish(),
  peaks: z.array(z.tuple([z.number(), z.number()])),
  formula: z.string().nullish(),
  casRn: z.string().nullish(),
  ionizationEnergyEv: z.number().nullish(),
  retentionIndex: z.union([z.number(), z.object({ value: z.number() }).transform((ri) => ri.value)]).nullish(),
  inlet: z.string().nullish(),
  spectrometerType: z.string().nullish(),
});

export type UploadedBlock = z.infer<typeof uploadedBlockSchema>;

export const uploadResultSchema = z.object({
  fileName: z.string(),
  format: z.enum(['jcamp', 'table']),
  blocks: z.array(uploadedBlockSchema),
});

export type UploadResult = z.infer<typeof uploadResultSchema>;

/** `POST /uploads/spectra` (multipart field `file`): the server reads JCAMP-DX, CSV or TXT. */
export function useUploadSpectrum() {
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return apiClient.postForm('/api/v1/uploads/spectra', uploadResultSchema, form);
    },
  });
}
