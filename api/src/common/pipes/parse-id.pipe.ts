import { Injectable, PipeTransform } from '@nestjs/common';
import { isUUID } from 'class-validator';
import { CommonErrors } from '../errors/app-error';

/** Route ids are UUID strings; anything else is a 400 with a readable message. */
@Injectable()
export class ParseIdPipe implements PipeTransform<string, string> {
  transform(value: string): string {
    if (!isUUID(value)) throw CommonErrors.validation(['id must be a UUID']);
    return value.toLowerCase();
  }
}
