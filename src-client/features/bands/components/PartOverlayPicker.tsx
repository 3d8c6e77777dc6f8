import { useState } from 'react';
import { Button, FormGroup, InputGroup, Menu, MenuItem, Popover, Tag } from '@blueprintjs/core';
import type { PartCoverage } from '../types';
import { usePartMatches } from '../api/search-parts';

export interface PartOverlayPickerProps {
  selected: PartCoverage | null;
  onSelect: (partId: number | null) => void;
}

/** Picks one catalogue part whose VSWR ≤ 2 ranges are drawn on every band strip of the page. */
export function PartOverlayPicker({ selected, onSelect }: PartOverlayPickerProps) {
  const [text, setText] = useState('');
  const matches = usePartMatches(text);
  const open = text.trim().length >= 2 && (matches.data?.length ?? 0) > 0;

  if (selected) {
    return (
      <FormGroup label="Part on the strips" helperText="Its ranges at VSWR ≤ 2 (measured S11, else datasheet bands) under each band.">
        <Tag large onRemove={() => onSelect(null)} data-testid="strip-part">
          {selected.manufacturer} {selected.mpn}
        </Tag>
      </FormGroup>
    );
  }
  return (
    <FormGroup label="Compare a part" labelFor="strip-part-search" helperText="Type an MPN or title; open Show strip on a group.">
      <Popover
        isOpen={open}
        autoFocus={false}
        enforceFocus={false}
        placement="bottom-start"
        minimal
        content={
          <Menu>
            {(matches.data ?? []).map((p) => (
              <MenuItem
                key={p.id}
                text={`${p.manufacturer} ${p.mpn}`}
                label={p.title.slice(0, 40)}
                onClick={() => {
                  onSelect(p.id);
                  setText('');
                }}
              />
            ))}
          </Menu>
        }
      >
        <InputGroup
          id="strip-part-search"
          leftIcon="search"
          placeholder="e.g. KA-FX"
          value={text}
          onValueChange={setText}
          rightElement={text ? <Button variant="minimal" icon="cross" aria-label="Clear" onClick={() => setText('')} /> : undefined}
        />
      </Popover>
    </FormGroup>
  );
}
