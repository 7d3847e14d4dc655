/** Reads a chosen file as UTF-8 text, reporting progress (0–1) as large files load. */
export function readFileAsText(file: Blob, onProgress?: (share: number) => void): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    reader.onload = () => {
      onProgress?.(1);
      resolve(String(reader.result ?? ''));
    };
    reader.onerror = () => reject(reader.error ?? new Error('The file could not be read'));
    reader.readAsText(file);
  });
}
