/** A phone photo is 2–12 MB; 15 MB leaves room without inviting a video. */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;
export const MAX_PHOTOS_PER_REQUEST = 5;
