import { registerDecorator, type ValidationArguments, type ValidationOptions } from 'class-validator';

/** The field must be greater than a sibling field, e.g. sweep.toHz > sweep.fromHz. */
export function IsGreaterThan(sibling: string, options?: ValidationOptions) {
  return (target: object, propertyName: string) =>
    registerDecorator({
      name: 'isGreaterThan',
      target: target.constructor,
      propertyName,
      constraints: [sibling],
      options: { message: `must be greater than ${sibling}`, ...options },
      validator: {
        validate(value: unknown, args: ValidationArguments) {
          const other = (args.object as Record<string, unknown>)[sibling];
          return typeof value === 'number' && typeof other === 'number' && value > other;
        },
      },
    });
}
