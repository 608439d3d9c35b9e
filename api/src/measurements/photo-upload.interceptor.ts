import { BadRequestException, CallHandler, ExecutionContext, Injectable, NestInterceptor, PayloadTooLargeException } from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { MeasurementErrors } from './measurements.errors';
import { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_REQUEST } from './photo-limits';

const MulterPhotos = FilesInterceptor('photos', MAX_PHOTOS_PER_REQUEST, {
  // keep the name as sent, so a name with a folder path is refused rather than silently cut to its last part
  preservePath: true,
  limits: { fileSize: MAX_PHOTO_BYTES, files: MAX_PHOTOS_PER_REQUEST, fields: 10, parts: MAX_PHOTOS_PER_REQUEST + 10 },
});

/**
 * multer with the photo limits, its refusals reworded so a person knows what to do ("File too large" becomes the
 * limit and what to send instead).
 */
@Injectable()
export class PhotoUploadInterceptor implements NestInterceptor {
  private readonly multer = new MulterPhotos();

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await this.multer.intercept(context, next);
    } catch (error) {
      throw reworded(error);
    }
  }
}

function reworded(error: unknown): unknown {
  if (error instanceof PayloadTooLargeException) return MeasurementErrors.photoTooLarge();
  if (error instanceof BadRequestException) {
    const message = error.message;
    if (/Too many files|Too many parts/.test(message) || /Unexpected file field - photos$/.test(message)) return MeasurementErrors.photoTooMany();
    if (/Unexpected file field/.test(message)) return MeasurementErrors.photoWrongField();
  }
  return error;
}
