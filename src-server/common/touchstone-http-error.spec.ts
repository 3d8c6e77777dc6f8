import { readTouchstone } from '../rf/touchstone';
import { DomainError } from './domain-error';
import { touchstoneHttpError, withTouchstoneStatus } from './touchstone-http-error';

function thrownBy(run: () => unknown): unknown {
  try {
    run();
  } catch (error) {
    return error;
  }
  throw new Error('expected an error');
}

describe(touchstoneHttpError.name, () => {
  it('answers a file too large with 413 and a malformed one with 422, keeping the code, message and line', () => {
    const tooLarge = thrownBy(() => withTouchstoneStatus(() => readTouchstone('# MHz S RI\n1 0 0\n', { maxBytes: 4 })));
    expect(tooLarge).toBeInstanceOf(DomainError);
    expect(tooLarge).toMatchObject({ code: 'TOUCHSTONE_TOO_LARGE', status: 413, details: { line: null } });
    const malformed = thrownBy(() => withTouchstoneStatus(() => readTouchstone('# MHz S RI\n1 0 0\n2 x 0\n')));
    expect(malformed).toMatchObject({ code: 'TOUCHSTONE_BAD_NUMBER', status: 422, details: { line: 3 }, message: expect.stringMatching(/^line 3: /) });
  });

  it('lets any other error through unchanged', () => {
    const other = new RangeError('not a Touchstone problem');
    expect(
      thrownBy(() =>
        withTouchstoneStatus(() => {
          throw other;
        }),
      ),
    ).toBe(other);
    expect(withTouchstoneStatus(() => 7)).toBe(7);
  });
});
