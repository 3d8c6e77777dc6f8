import { ArgumentMetadata, Injectable, PipeTransform } from '@nestjs/common';
import { ValidationFailedError } from '../common/domain-error';

/** Rule ids are the kebab-case names of rules/*.json. */
@Injectable()
export class ParseRuleIdPipe implements PipeTransform<string, string> {
  transform(value: string, metadata: ArgumentMetadata): string {
    if (!/^[a-z0-9][a-z0-9-]{1,62}[a-z0-9]$/.test(value)) {
      throw new ValidationFailedError([
        { field: metadata.data ?? 'ruleId', message: `must be a rule id (lower-case letters, digits, dashes), got "${String(value).slice(0, 40)}"` },
      ]);
    }
    return value;
  }
}
