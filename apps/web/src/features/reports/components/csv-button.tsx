import { Button, Stack, Text } from '@chakra-ui/react';
import { errorMessage } from '../../../lib/api-error.js';
import { useFileDownload } from '../../../lib/use-file-download.js';

/** Fetches a CSV export with the person's token and saves it; a refusal is said beside the button. */
export function CsvButton({ path, label }: { path: string; label: string }) {
  const download = useFileDownload(path, 'catline-export.csv');
  return (
    <Stack gap="1" align="flex-start">
      <Button size="sm" variant="outline" loading={download.isPending} onClick={() => download.mutate()}>
        {label}
      </Button>
      {download.isError && (
        <Text role="alert" fontSize="xs" color="nogo.fg" maxW="16rem">
          {errorMessage(download.error)}
        </Text>
      )}
    </Stack>
  );
}
