import { Injectable, type PipeTransform } from '@nestjs/common';
import { z } from 'zod';
import { NotFoundError } from '../errors/app-error.js';

const uuid = z.uuid();

/** Route ids are uuids; anything else cannot name a record, so it answers 404 like a foreign id. */
@Injectable()
export class ParseIdPipe implements PipeTransform<string, string> {
  transform(value: string): string {
    if (!uuid.safeParse(value).success) throw new NotFoundError();
    return value;
  }
}
