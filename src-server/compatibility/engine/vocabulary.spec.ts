import * as bandVocabulary from '../../bands/band-domain';
import * as partVocabulary from '../../parts/part.types';
import * as radioVocabulary from '../../products/radio.entity';
import { LIFECYCLES, POLARIZATIONS, REVIEW_STATES, TECHNOLOGIES } from './types';

/** The engine's closed vocabularies are the ones the database holds, so a rule can name only a state a part can be in. */
describe('engine vocabularies', () => {
  it('knows exactly the review states and lifecycles a stored part can have', () => {
    expect([...REVIEW_STATES]).toEqual([...partVocabulary.REVIEW_STATES]);
    expect([...LIFECYCLES]).toEqual([...partVocabulary.LIFECYCLES]);
  });

  it('knows exactly the technologies of the band library', () => {
    expect([...TECHNOLOGIES]).toEqual([...bandVocabulary.TECHNOLOGIES]);
  });

  it('spells polarizations as parts and radios store them (a radio may also accept any)', () => {
    expect([...POLARIZATIONS]).toEqual([...partVocabulary.POLARIZATIONS]);
    expect([...radioVocabulary.POLARIZATIONS]).toEqual([...POLARIZATIONS, 'any']);
  });
});
