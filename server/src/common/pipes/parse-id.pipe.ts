import { Injectable, type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import { fieldError } from '../errors/field-error.js';

/** Route ids are positive whole numbers; anything else is a 400 naming the parameter. */
@Injectable()
export class ParseIdPipe implements PipeTransform<string, number> {
  transform(value: string, metadata: ArgumentMetadata): number {
    const field = metadata.data ?? 'id';
    if (!/^[1-9][0-9]{0,15}$/.test(value)) {
      const message = `${field} must be a positive whole number`;
      throw fieldError(field, message);
    }
    return Number(value);
  }
}
