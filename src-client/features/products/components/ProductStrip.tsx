import { useMemo } from 'react';
import { Section, SectionCard } from '@blueprintjs/core';
import { FrequencyStrip, type StripRow } from '../../../components/FrequencyStrip';
import type { ProductDetail } from '../types';

export interface ProductStripProps {
  product: ProductDetail;
}

/** The product's required ranges, one row per radio, on Bandwright's frequency strip. */
export function ProductStrip({ product }: ProductStripProps) {
  const rows: StripRow[] = useMemo(
    () =>
      product.radios.map((radio) => ({
        id: radio.id,
        label: radio.name,
        ranges: radio.bands.flatMap((b) => b.band.ranges.map((r) => ({ ...r, label: b.band.designation }))),
      })),
    [product.radios],
  );
  if (!rows.length) return null;
  return (
    <Section
      title="Band plan"
      subtitle="What the antennas must cover, per radio; hover a bar for its edges"
      icon="timeline-bar-chart"
      className="bw-gap"
      collapsible
    >
      <SectionCard>
        <FrequencyStrip rows={rows} title={`Required ranges of ${product.name}`} />
      </SectionCard>
    </Section>
  );
}
