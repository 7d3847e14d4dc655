import type { PhotoView } from '@pondwright/shared';
import { formatDate } from '@/lib/format';
import { PHOTO_KIND_LABELS } from './labels';

/** How a photo is named to people and screen readers: its caption, else its kind and day. */
export function photoName(photo: PhotoView): string {
  return photo.caption || `${PHOTO_KIND_LABELS[photo.kind]} photo, ${formatDate(photo.createdAt)}`;
}

export function photoCredit(photo: PhotoView): string {
  const by = photo.uploadedByName ? ` by ${photo.uploadedByName}` : '';
  return `${PHOTO_KIND_LABELS[photo.kind]} · ${formatDate(photo.createdAt)}${by}`;
}
