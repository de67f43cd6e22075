/** Hands a file to the browser's download, as every export and the scenario file do. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // The click has handed the blob to the download; freeing it at once can cancel it in some browsers.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
