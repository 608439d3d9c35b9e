import { AppError } from '../common/errors/app-error';
import { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_REQUEST } from './photo-limits';

export const MeasurementErrors = {
  noChassis: () =>
    new AppError(409, 'measurement_no_chassis', 'Choose the chassis model of the project first: the measurement points come from it.'),
  chassisNotFound: () =>
    new AppError(404, 'measurement_chassis_not_found', "That chassis model is not in your shop's catalog: pick one from the catalog's chassis list."),
  unknownPoint: (pointId: string) =>
    new AppError(404, 'measurement_point_not_found', `"${pointId}" is not a point of this chassis's measurement template.`),
  badValue: (message: string) => new AppError(400, 'validation_failed', message, [message]),
  reasonRequired: () =>
    new AppError(409, 'measurement_reason_required', 'The sheet is signed off: say why the value changes (reason) to change it.'),
  incomplete: (labels: string[]) =>
    new AppError(409, 'measurement_sheet_incomplete', `Measure these points before signing off: ${labels.join('; ')}.`, labels),
  readingChanged: (theirs: { by: string; reading: string; at: string }, yours: string) =>
    new AppError(
      409,
      'measurement_reading_changed',
      `${theirs.by} recorded ${theirs.reading} here at ${theirs.at}; yours (${yours}) was not saved. Keep theirs, or save yours over it.`,
    ),
  alreadySignedOff: () => new AppError(409, 'measurement_sheet_signed_off', 'The sheet is already signed off.'),
  photoNotFound: () => new AppError(404, 'photo_not_found', 'That photo does not exist in your shop.'),
  photoNoFiles: () => new AppError(400, 'photo_missing', 'Attach at least one photo (field "photos").'),
  photoEmpty: (name: string) => new AppError(400, 'photo_empty', `"${safeName(name)}" is empty (0 bytes): take the photo again.`),
  photoNotImage: (name: string) =>
    new AppError(415, 'photo_not_image', `"${safeName(name)}" is not a JPEG, PNG or WebP photo (its content was read, not its name).`),
  photoHeif: (name: string) =>
    new AppError(
      415,
      'photo_heif_not_accepted',
      `"${safeName(name)}" is a HEIC/HEIF photo, which is not accepted yet. Send it as a JPEG: set the camera to save photos as JPEG, or share or export the photo as JPEG, then add it again.`,
    ),
  photoTruncated: (name: string) =>
    new AppError(400, 'photo_truncated', `"${safeName(name)}" is cut short (the upload did not finish): send it again.`),
  photoTooManyPixels: (name: string, width: number, height: number) =>
    new AppError(400, 'photo_too_many_pixels', `"${safeName(name)}" is ${width} × ${height} pixels; send a photo of at most 100 megapixels.`),
  photoBadName: (name: string) =>
    new AppError(
      400,
      'photo_bad_name',
      `"${safeName(name)}" has a folder path or control characters in its name: send the photo file itself (a plain name such as crossmember.jpg).`,
    ),
  photoSignedOff: () =>
    new AppError(
      409,
      'measurement_sheet_signed_off',
      'The sheet is signed off: its photos stay with it as the record of what was measured. Add another photo if one is missing.',
    ),
  photoForbidden: () => new AppError(403, 'forbidden', 'Only the person who added a photo or the shop owner may delete it.'),
  photoReplaceForbidden: () => new AppError(403, 'forbidden', "Only the shop's fabricator or owner may replace a customer's photo."),
  photoNotPending: () => new AppError(409, 'photo_not_pending', 'Only a photo a customer added waits to be accepted.'),
  photoTooLarge: () =>
    new AppError(
      413,
      'photo_too_large',
      `A photo is over ${MAX_PHOTO_BYTES / 1024 / 1024} MB: send it at the camera's normal size (not RAW or a video), one photo at a time.`,
    ),
  photoTooMany: () =>
    new AppError(400, 'photo_too_many', `Up to ${MAX_PHOTOS_PER_REQUEST} photos per upload: send the rest in another upload.`),
  photoWrongField: () => new AppError(400, 'photo_wrong_field', 'Send the photos in the form field "photos".'),
};

/** A client's file name, echoed in a message only: no path, no control characters, bounded. */
function safeName(name: string): string {
  const base = String(name ?? '').split(/[\\/]/).pop() ?? '';
  return base.replace(/[^\w .()-]/g, '_').slice(0, 80) || 'photo';
}
