/**
 * Multer's limits for a photo upload. The file limit is the largest allowed by configuration (50 MB);
 * the configured limit (PHOTO_MAX_BYTES, 15 MB by default) is checked by the service with a clear
 * message, and multer stops reading anything beyond the hard cap without holding it in memory.
 */
export const PHOTO_UPLOAD_LIMITS = {
  fileSize: 50 * 1024 * 1024,
  files: 1,
  fields: 5,
  fieldSize: 1024,
};
