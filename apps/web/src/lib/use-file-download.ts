import { useMutation } from '@tanstack/react-query';
import { apiFile } from './api-client.js';
import { saveFile } from './save-file.js';

/** Downloads a file the API serves to signed-in people and saves it under the server's name. */
export function useFileDownload(path: string, fallbackName: string) {
  return useMutation({
    mutationFn: async () => {
      const { blob, fileName } = await apiFile(path);
      saveFile(blob, fileName ?? fallbackName);
    },
  });
}
