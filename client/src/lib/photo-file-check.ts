// Here in lib because the office's uploader (features/jobs) and the crew's daily log check files alike.

/** What the server stores: JPEG, PNG or WebP, at most 15 MB (`PHOTO_MAX_BYTES`). */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;

const megabytes = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1).replace(/\.0$/, '')} MB`;

/** The first bytes of each format the server accepts; the server checks the same. */
function looksLikePhoto(head: Uint8Array): boolean {
  const starts = (...bytes: number[]) => bytes.every((byte, at) => head[at] === byte);
  const ascii = (from: number, text: string) =>
    [...text].every((char, at) => head[from + at] === char.charCodeAt(0));
  return (
    starts(0xff, 0xd8, 0xff) ||
    starts(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a) ||
    (ascii(0, 'RIFF') && ascii(8, 'WEBP'))
  );
}

function readHead(file: Blob): Promise<Uint8Array> {
  const head = file.slice(0, 12);
  if (typeof head.arrayBuffer === 'function') {
    return head.arrayBuffer().then((buffer) => new Uint8Array(buffer));
  }
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(new Uint8Array(reader.result as ArrayBuffer));
    reader.onerror = () => reject(reader.error);
    reader.readAsArrayBuffer(head);
  });
}

/**
 * Why a file cannot be a job photo, checked on the device before any upload; null when it may go.
 * The browser's type comes from the file name, so the first bytes are read too: a program renamed
 * `.jpg` is still refused here, and the server checks the bytes again.
 */
export async function photoFileProblem(file: File): Promise<string | null> {
  const typeOk = (PHOTO_TYPES as readonly string[]).includes(file.type) || file.type === '';
  const notAPhoto = `“${file.name}” is not a JPEG, PNG or WebP photo.`;
  if (!typeOk) return `${notAPhoto} Choose a photo from the camera or gallery.`;
  if (file.size > PHOTO_MAX_BYTES) {
    return `“${file.name}” is ${megabytes(file.size)}; a photo can be at most ${megabytes(PHOTO_MAX_BYTES)}. Take it again at a lower size, or save it as a JPEG.`;
  }
  try {
    if (!looksLikePhoto(await readHead(file))) {
      return `${notAPhoto} Its contents are not an image, whatever its name says.`;
    }
  } catch {
    return `“${file.name}” could not be read. Choose it again.`;
  }
  return null;
}
