import { ArgumentMetadata, Injectable, PipeTransform } from '@nestjs/common';
import { ValidationFailedError } from './domain-error';
import { INT_MAX } from './dto-fields';

/** Route ids are positive integers that fit an INT column; anything else is a 400 naming the parameter. */
@Injectable()
export class ParseIdPipe implements PipeTransform<string, number> {
  transform(value: string, metadata: ArgumentMetadata): number {
    const id = Number(value);
    if (!/^\d{1,10}$/.test(value) || !Number.isSafeInteger(id) || id < 1 || id > INT_MAX) {
      throw new ValidationFailedError([{ field: metadata.data ?? 'id', message: `must be a positive integer id, got "${String(value).slice(0, 40)}"` }]);
    }
    return id;
  }
}
