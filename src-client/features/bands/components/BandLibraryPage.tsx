import { useCallback, useMemo, useState } from 'react';
import { Button, FormGroup, HTMLSelect, InputGroup, NonIdealState, Section, SectionCard, Tag } from '@blueprintjs/core';
import { Cell, Column, Table, TruncatedFormat } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { FrequencyStrip } from '../../../components/FrequencyStrip';
import { useBands } from '../api/get-bands';
import { type Band, type BandFilter, type PartCoverage, type Technology, TECHNOLOGY_LABELS } from '../types';
import { BandsNav } from '../../../components/BandsNav';
import { PartOverlayPicker } from './PartOverlayPicker';
import { usePartCoverage } from '../api/get-part-coverage';
import { describeRanges, describeSource } from './band-format';

const TECH_ORDER = Object.keys(TECHNOLOGY_LABELS) as Technology[];

const COLUMNS: { id: string; name: string; width: number; value: (b: Band) => string }[] = [
  { id: 'designation', name: 'Designation', width: 130, value: (b) => b.designation },
  { id: 'ranges', name: 'Ranges', width: 270, value: describeRanges },
  { id: 'duplex', name: 'Duplex', width: 110, value: (b) => b.duplex },
  { id: 'name', name: 'Name', width: 300, value: (b) => b.name },
  { id: 'source', name: 'Source', width: 330, value: describeSource },
  { id: 'note', name: 'Source note', width: 480, value: (b) => b.source.note ?? '' },
  { id: 'regions', name: 'Regions (indicative)', width: 150, value: (b) => b.regions.join(', ') },
];

interface BandGroupProps {
  technology: Technology;
  bands: Band[];
  /** A part whose covered ranges are drawn under each band, clipped to the band's span. */
  part: PartCoverage | null;
}

function BandGroup({ technology, bands, part }: BandGroupProps) {
  const [showStrip, setShowStrip] = useState(false);
  const getCellData = useCallback((row: number, col: number) => COLUMNS[col].value(bands[row]), [bands]);
  const renderers = useMemo(
    () =>
      COLUMNS.map((_, col) => (row: number) => (
        <Cell>
          <TruncatedFormat detectTruncation>{getCellData(row, col)}</TruncatedFormat>
        </Cell>
      )),
    [getCellData],
  );
  const stripRows = useMemo(
    () =>
      bands.map((b) => {
        const from = Math.min(...b.ranges.map((r) => r.fromMhz));
        const to = Math.max(...b.ranges.map((r) => r.toMhz));
        const covered = (part?.coveredRanges ?? [])
          .filter((c) => c.toMhz > from && c.fromMhz < to)
          .map((c) => ({ fromMhz: Math.max(c.fromMhz, from), toMhz: Math.min(c.toMhz, to), label: `${part!.mpn} VSWR ≤ 2 (${c.source})` }));
        return { id: b.id, label: b.designation, ranges: b.ranges.map((r) => ({ ...r, label: b.designation })), covered };
      }),
    [bands, part],
  );
  return (
    <Section
      title={TECHNOLOGY_LABELS[technology]}
      rightElement={
        <>
          <Tag minimal round>
            {bands.length}
          </Tag>
          <Button
            size="small"
            variant="minimal"
            icon="timeline-bar-chart"
            text={showStrip ? 'Hide strip' : 'Show strip'}
            onClick={() => setShowStrip(!showStrip)}
          />
        </>
      }
      className="bw-gap"
      data-testid={`band-group-${technology}`}
    >
      {showStrip && (
        <SectionCard>
          <FrequencyStrip rows={stripRows} title={`${TECHNOLOGY_LABELS[technology]} bands`} />
        </SectionCard>
      )}
      <SectionCard padded={false}>
        <Table
          numRows={bands.length}
          defaultRowHeight={30}
          columnWidths={COLUMNS.map((c) => c.width)}
          getCellClipboardData={getCellData}
          enableRowHeader={false}
        >
          {COLUMNS.map((c, i) => (
            <Column key={c.id} id={c.id} name={c.name} cellRenderer={renderers[i]} />
          ))}
        </Table>
      </SectionCard>
    </Section>
  );
}

/** The standard bands by technology, each with the published table it comes from. */
export function BandLibraryPage() {
  const [technology, setTechnology] = useState<Technology | ''>('');
  const [frequency, setFrequency] = useState('');
  const f = Number(frequency);
  const validFrequency = frequency.trim() !== '' && Number.isFinite(f) && f > 0;
  const filter: BandFilter = { technology: technology || undefined, ...(validFrequency ? { fromMhz: f, toMhz: f } : {}) };
  const bands = useBands(filter);
  const [partId, setPartId] = useState<number | null>(null);
  const part = usePartCoverage(partId);
  const groups = useMemo(() => {
    const all = bands.data ?? [];
    return TECH_ORDER.map((t) => ({ technology: t, bands: all.filter((b) => b.technology === t) })).filter((g) => g.bands.length);
  }, [bands.data]);

  return (
    <>
      <PageHeader
        title="Band library"
        subtitle="Standard radio bands with the published table each one comes from. Edges are the specification's; check the release a module was certified against."
      />
      <BandsNav />
      <div className="bw-row bw-gap">
        <FormGroup label="Technology" labelFor="band-technology">
          <HTMLSelect
            id="band-technology"
            value={technology}
            onChange={(e) => setTechnology(e.currentTarget.value as Technology | '')}
            options={[{ value: '', label: 'All technologies' }, ...TECH_ORDER.map((t) => ({ value: t, label: TECHNOLOGY_LABELS[t] }))]}
          />
        </FormGroup>
        <FormGroup
          label="Contains frequency (MHz)"
          labelFor="band-frequency"
          intent={frequency && !validFrequency ? 'danger' : 'none'}
          helperText={frequency && !validFrequency ? 'Enter a frequency in MHz, e.g. 1575.42' : undefined}
        >
          <InputGroup id="band-frequency" leftIcon="search" placeholder="e.g. 868" value={frequency} onValueChange={setFrequency} />
        </FormGroup>
        <PartOverlayPicker selected={part.data ?? null} onSelect={setPartId} />
      </div>
      <QueryState isPending={bands.isPending} error={bands.error}>
        {groups.length === 0 ? (
          <NonIdealState icon="search" title="No band matches" />
        ) : (
          groups.map((g) => <BandGroup key={g.technology} technology={g.technology} bands={g.bands} part={part.data ?? null} />)
        )}
      </QueryState>
    </>
  );
}
