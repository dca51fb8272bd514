// Photo limits, shared by the browser form and the server (no server-only imports here).
export const MAX_PHOTOS = 6;
/** 10 MB: a full-resolution phone JPEG is 3–6 MB; anything larger is usually a video or a RAW. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
