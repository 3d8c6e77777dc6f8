import * as bandVocabulary from '../../bands/band-domain';
import * as partVocabulary from '../../parts/part.types';
import { LIFECYCLES, REVIEW_STATES, TECHNOLOGIES } from './types';

/** The engine's closed vocabularies are the ones the database holds, so a rule can name only a state a part can be in. */
describe('engine vocabularies', () => {
  it('knows exactly the review states and lifecycles a stored part can have', () => {
    expect([...REVIEW_STATES]).toEqual([...partVocabulary.REVIEW_STATES]);
    expect([...LIFECYCLES]).toEqual([...partVocabulary.LIFECYCLES]);
  });

  it('knows exactly the technologies of the band library', () => {
    expect([...TECHNOLOGIES]).toEqual([...bandVocabulary.TECHNOLOGIES]);
  });
});
