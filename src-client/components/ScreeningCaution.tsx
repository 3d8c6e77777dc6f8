import { Callout, Intent } from '@blueprintjs/core';

export interface ScreeningCautionProps {
  /** Shorter wording for tight places such as side panels. @default false */
  compact?: boolean;
}

/** The caution that travels with every computed result (product brief, "Cautions"). */
export function ScreeningCaution({ compact = false }: ScreeningCautionProps) {
  if (compact) {
    return (
      <Callout intent={Intent.WARNING} icon="warning-sign" compact className="bw-caution">
        Screening estimate only. Confirm regulatory approval and RF exposure with an accredited lab and the local regulator; measure in the final enclosure.
      </Callout>
    );
  }
  return (
    <Callout intent={Intent.WARNING} icon="warning-sign" title="Screening estimates" className="bw-caution">
      Results come from datasheet and measured data and are estimates. Regulatory approval (radio type approval, the antenna-gain limits of a module&apos;s
      grant) and RF exposure (SAR/MPE) must be confirmed by an accredited lab and the local regulator; performance in the final enclosure must be measured.
      Defer to local codes and licensed practice.
    </Callout>
  );
}
