import { Injectable, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { randomUUID } from 'node:crypto';
import { MeasurementErrors } from './measurements.errors';
import { checkClientName, checkImage, stripLocationMetadata, type CheckedImage } from './photo-image';
import { PhotoStorage } from './photo-storage';

/** A photo as multer hands it over (memory storage). */
export interface UploadedPhotoFile {
  originalname: string;
  buffer: Buffer;
}

/** A checked photo with its location metadata stripped and a generated storage key, not stored yet. */
export interface PreparedPhoto {
  image: CheckedImage;
  data: Buffer;
  key: string;
}

/**
 * The photo pipeline every module that takes photos shares (measurement sheets, work-order checks): names and contents
 * checked, location metadata stripped, files kept by the storage driver under generated keys, served with nosniff.
 * Each module keeps its own table of photos and decides who may see them.
 */
@Injectable()
export class PhotoIntakeService {
  private readonly logger = new Logger(PhotoIntakeService.name);

  constructor(private readonly storage: PhotoStorage) {}

  /** Checks every file (name, content, pixel count, completeness) before any is stored; refuses with a 4xx a person can act on. */
  async prepare(files: UploadedPhotoFile[] | undefined): Promise<PreparedPhoto[]> {
    if (!files || files.length === 0) throw MeasurementErrors.photoNoFiles();
    for (const file of files) checkClientName(file.originalname);
    return Promise.all(
      files.map(async (file) => {
        const image = checkImage(file.buffer, file.originalname);
        const data = await stripLocationMetadata(file.buffer, image.extension);
        return { image, data, key: `${randomUUID()}.${image.extension}` };
      }),
    );
  }

  /**
   * Stores the prepared files, then runs `record` (the rows, in the caller's transaction); when anything fails, the files
   * written are removed again, so no file is left without its row.
   */
  async storeWith<T>(prepared: PreparedPhoto[], record: () => Promise<T>): Promise<T> {
    const written: string[] = [];
    try {
      for (const photo of prepared) {
        await this.storage.put(photo.key, photo.data);
        written.push(photo.key);
      }
      return await record();
    } catch (error) {
      await Promise.all(written.map((key) => this.storage.remove(key)));
      throw error;
    }
  }

  async read(key: string): Promise<Buffer> {
    const data = await this.storage.get(key);
    if (!data) throw MeasurementErrors.photoNotFound();
    return data;
  }

  async remove(key: string): Promise<void> {
    await this.storage.remove(key);
  }

  /**
   * Removes a photo's file once its row's removal has committed. The row is what the product shows, so the person's
   * removal stands even when the store cannot be reached right then: the file left behind is private, unnamed and
   * unreachable, and is logged for clean-up rather than answered as a failure.
   */
  async discard(key: string): Promise<void> {
    try {
      await this.storage.remove(key);
    } catch (error) {
      this.logger.warn(`Photo file ${key} was not removed from storage: ${(error as Error).message}`);
    }
  }
}

/** Answers with a stored photo: its checked type, nosniff, inline under its id, cached only privately. */
export function sendPhoto(res: Response, photo: { id: string; contentType: string }, data: Buffer): void {
  res.setHeader('Content-Type', photo.contentType);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Content-Disposition', `inline; filename="${photo.id}"`);
  res.setHeader('Cache-Control', 'private, max-age=3600');
  res.send(data);
}
