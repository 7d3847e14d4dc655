/**
 * Hands a fetched file to the browser as a download. Files behind the API need the bearer token, which
 * a plain link cannot carry, so they are fetched first and saved through an object URL.
 */
export function saveFile(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the URL is released.
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}
