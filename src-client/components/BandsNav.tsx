import { Tab, Tabs } from '@blueprintjs/core';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '../app/routes/paths';

/** Switches between the three reference pages of the band library (bands and band sets, regulatory limits). */
export function BandsNav() {
  const location = useLocation();
  const navigate = useNavigate();
  return (
    <Tabs id="bands-nav" selectedTabId={location.pathname} onChange={(id) => navigate(String(id))} className="bw-gap">
      <Tab id={paths.bands} title="Bands" icon="cell-tower" />
      <Tab id={paths.bandSets} title="Band sets" icon="layers" />
      <Tab id={paths.regulatoryLimits} title="Regulatory limits" icon="take-action" />
    </Tabs>
  );
}
