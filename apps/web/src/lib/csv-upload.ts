/** The multipart form field the API reads an uploaded CSV file from. */
const CSV_FIELD = 'file';

/**
 * The file as the import routes take it. Some systems give a .csv file no type at all, which the
 * browser would send as binary: such a file goes as text/csv, and the server still checks its content.
 */
export function csvFormData(file: File): FormData {
  const typed =
    file.type === '' && /\.csv$/i.test(file.name) ? new File([file], file.name, { type: 'text/csv' }) : file;
  const form = new FormData();
  form.append(CSV_FIELD, typed);
  return form;
}
