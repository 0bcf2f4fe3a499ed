/** Saves a blob under a file name through a temporary object URL and a clicked link (no network). */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  a.style.display = 'none';
  document.body.append(a);
  a.click();
  a.remove();
  // Revoked after the click's task: some browsers start the download asynchronously.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
