// Hand a Blob to the browser as a download with a name.
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // After the click has been handled: revoking at once can cancel the download.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
