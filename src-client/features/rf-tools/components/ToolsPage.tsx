import { Tab, Tabs } from '@blueprintjs/core';
import { useState } from 'react';
import { PageHeader } from '../../../components/PageHeader';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { ConversionsPanel } from './ConversionsPanel';
import { LinkBudgetPanel } from './LinkBudgetPanel';
import { MatchingPanel } from './MatchingPanel';
import { TouchstonePanel } from './TouchstonePanel';

type ToolTab = 'touchstone' | 'conversions' | 'matching' | 'link';

/** The calculators engineers reach for during antenna selection. */
export function ToolsPage() {
  const [tab, setTab] = useState<ToolTab>('touchstone');
  return (
    <div>
      <PageHeader title="Tools" subtitle="Touchstone preview, RF conversions, an L-section starting point and a free-space link budget" />
      <ScreeningCaution compact />
      <Tabs id="tools" selectedTabId={tab} onChange={(next) => setTab(next as ToolTab)} large>
        <Tab id="touchstone" title="Touchstone preview" panel={<TouchstonePanel />} />
        <Tab id="conversions" title="Conversions" panel={<ConversionsPanel />} />
        <Tab id="matching" title="Matching" panel={<MatchingPanel />} />
        <Tab id="link" title="Link budget" panel={<LinkBudgetPanel />} />
      </Tabs>
    </div>
  );
}
