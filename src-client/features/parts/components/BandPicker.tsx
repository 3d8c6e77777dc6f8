import { HTMLSelect, Tag } from '@blueprintjs/core';
import { useMemo } from 'react';
import { useLibraryBands } from '../api/get-library-bands';
import type { LibraryBand } from '../types';
import { bandSpan } from './part-labels';

export interface BandPickerProps {
  selected: LibraryBand[];
  onChange: (bands: LibraryBand[]) => void;
  /** Accessible name of the add-band select. @default 'Add band' */
  label?: string;
}

/** Bands from the band library, added one at a time and shown as removable tags. */
export function BandPicker({ selected, onChange, label = 'Add band' }: BandPickerProps) {
  const bands = useLibraryBands();
  const options = useMemo(() => {
    const chosen = new Set(selected.map((b) => b.id));
    return (bands.data ?? []).filter((b) => !chosen.has(b.id) && b.ranges.length > 0);
  }, [bands.data, selected]);
  return (
    <div className="bw-band-picker">
      <HTMLSelect
        aria-label={label}
        value=""
        disabled={bands.isPending}
        onChange={(e) => {
          const band = options.find((b) => String(b.id) === e.currentTarget.value);
          if (band) onChange([...selected, band]);
        }}
      >
        <option value="">{bands.isPending ? 'Loading bands…' : `${label}…`}</option>
        {options.map((b) => {
          const span = bandSpan(b);
          return <option key={b.id} value={b.id}>{`${b.designation} (${b.technology}) ${span.fromMhz}–${span.toMhz} MHz`}</option>;
        })}
      </HTMLSelect>
      {selected.map((b) => (
        <Tag key={b.id} minimal onRemove={() => onChange(selected.filter((x) => x.id !== b.id))} data-testid="picked-band">
          {b.designation}
        </Tag>
      ))}
    </div>
  );
}
