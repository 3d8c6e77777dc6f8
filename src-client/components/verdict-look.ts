import { Intent } from '@blueprintjs/core';
import type { IconName } from '@blueprintjs/icons';
import type { components } from '../lib/api-types';

export type Verdict = components['schemas']['CellStatus'];

/** One look and one word per verdict, for the matrix, the candidates, the product verdict and the rule preview alike. */
export const VERDICT_LOOK: Record<Verdict, { intent: Intent; icon: IconName; label: string }> = {
  pass: { intent: Intent.SUCCESS, icon: 'tick-circle', label: 'Pass' },
  marginal: { intent: Intent.WARNING, icon: 'warning-sign', label: 'Marginal' },
  fail: { intent: Intent.DANGER, icon: 'error', label: 'Fail' },
  'no-data': { intent: Intent.NONE, icon: 'help', label: 'Not checked' },
};

/** The order the legend and summaries list verdicts in. */
export const VERDICTS: readonly Verdict[] = ['pass', 'marginal', 'fail', 'no-data'];
