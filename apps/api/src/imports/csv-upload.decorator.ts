import { applyDecorators, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConsumes } from '@nestjs/swagger';
import { CSV_FIELD, CSV_MAX_BYTES, CsvUploadInterceptor } from './csv-upload.js';

/** A route that takes one CSV file as multipart/form-data in the field `file`. */
export const CsvUpload = () =>
  applyDecorators(
    UseInterceptors(CsvUploadInterceptor),
    ApiConsumes('multipart/form-data'),
    ApiBody({
      schema: {
        type: 'object',
        required: [CSV_FIELD],
        properties: {
          [CSV_FIELD]: {
            type: 'string',
            format: 'binary',
            description: `A .csv file, UTF-8, at most ${CSV_MAX_BYTES / 1024} KB.`,
          },
        },
      },
    }),
  );
