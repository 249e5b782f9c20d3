/** Hands a downloaded file to the browser to save, as a link to it would have. */
export function saveFile(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // The click has started the download by now; the object URL only holds memory.
  setTimeout(() => URL.revokeObjectURL(url), 1_000);
}
