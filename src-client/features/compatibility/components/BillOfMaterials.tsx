import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Callout, FormGroup, H3, HTMLTable, InputGroup, Intent } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { useBillOfMaterials } from '../api/get-bill-of-materials';
import { QUANTITY_PARAM, quantityFromUrl } from './bom-quantity';
import { FEED_WORDS } from './candidate-words';
import './compatibility.css';

export interface BillOfMaterialsProps {
  productId: number;
}

/** The chosen parts at a build quantity (kept in the page URL): unit price, lead time and the antenna cost per product. */
export function BillOfMaterials({ productId }: BillOfMaterialsProps) {
  const [searchParams, setSearchParams] = useSearchParams();
  const quantity = quantityFromUrl(searchParams.get(QUANTITY_PARAM));
  const [typed, setTyped] = useState(String(quantity));
  useEffect(() => setTyped(String(quantity)), [quantity]);
  const bom = useBillOfMaterials(productId, quantity);
  const b = bom.data;

  const commit = (text: string) => {
    const next = quantityFromUrl(text.trim());
    setTyped(String(next));
    // Replace rather than push: typing a quantity is not a page the Back button should step through.
    setSearchParams(
      (params) => {
        const updated = new URLSearchParams(params);
        if (next === 1) updated.delete(QUANTITY_PARAM);
        else updated.set(QUANTITY_PARAM, String(next));
        return updated;
      },
      { replace: true },
    );
  };

  return (
    <section className="bw-bom" aria-labelledby="bw-bom-title" data-testid="bill-of-materials">
      <div className="bw-bom__head">
        <H3 id="bw-bom-title">Bill of materials</H3>
        <FormGroup label="Build quantity" labelFor="bom-quantity" inline className="bw-bom__quantity">
          <InputGroup
            id="bom-quantity"
            inputMode="numeric"
            value={typed}
            onValueChange={setTyped}
            onBlur={(e) => commit(e.currentTarget.value)}
            onKeyDown={(e) => e.key === 'Enter' && commit(e.currentTarget.value)}
            rightElement={<span className="bw-input-unit">products</span>}
            style={{ width: '10rem' }}
          />
        </FormGroup>
      </div>
      <QueryState isPending={bom.isPending} error={bom.error}>
        {b && (
          <>
            <HTMLTable compact striped className="bw-bom__table">
              <thead>
                <tr>
                  <th>Part</th>
                  <th>For radio</th>
                  <th className="bw-num">Per product</th>
                  <th className="bw-num">Bought</th>
                  <th className="bw-num">Unit price</th>
                  <th className="bw-num">Lead time</th>
                  <th className="bw-num">Cost per product</th>
                </tr>
              </thead>
              <tbody>
                {b.lines.map((line) => (
                  <tr key={line.partId} data-testid={`bom-line-${line.partId}`}>
                    <td>
                      <b>{line.mpn}</b>
                      <div className="bw-muted">
                        {line.manufacturer} · {FEED_WORDS[line.connector]}
                      </div>
                    </td>
                    <td>{line.radios.map((r) => r.name).join(', ')}</td>
                    <td className="bw-num bw-bom__price">{line.quantityPerUnit} pcs</td>
                    <td className="bw-num bw-bom__price">{line.buyQuantity.toLocaleString()} pcs</td>
                    <td className="bw-num">
                      {line.offer ? (
                        <>
                          <span className="bw-bom__price">
                            {line.offer.unitPrice} {line.offer.currency}
                          </span>
                          <div className="bw-muted">
                            {line.offer.supplier}, break {line.offer.breakQuantity.toLocaleString()} pcs
                          </div>
                        </>
                      ) : (
                        <span className="bw-muted">No offer for {line.buyQuantity.toLocaleString()} pcs</span>
                      )}
                    </td>
                    <td className="bw-num bw-bom__price">
                      {line.offer?.leadTimeDays !== null && line.offer?.leadTimeDays !== undefined ? `${line.offer.leadTimeDays} days` : 'not stated'}
                    </td>
                    <td className="bw-num bw-bom__price">{line.costPerUnit && line.offer ? `${line.costPerUnit} ${line.offer.currency}` : '—'}</td>
                  </tr>
                ))}
                {b.radiosWithoutPart.map((radio) => (
                  <tr key={`radio-${radio.radioId}`} className="bw-muted" data-testid={`bom-missing-${radio.radioId}`}>
                    <td colSpan={2}>{radio.name}: no part chosen, so no cost is counted</td>
                    <td colSpan={5} />
                  </tr>
                ))}
              </tbody>
              <tfoot>
                <tr>
                  <th colSpan={6}>Antenna cost per product{b.totalPerUnit.length > 1 ? ' (per currency, the offers mix them)' : ''}</th>
                  <th className="bw-num" data-testid="bom-total">
                    {b.totalPerUnit.length === 0 ? '—' : b.totalPerUnit.map((t) => <div key={t.currency}>{`${t.total} ${t.currency}`}</div>)}
                  </th>
                </tr>
              </tfoot>
            </HTMLTable>
            <p className="bw-muted">
              Prices at {b.quantity.toLocaleString()} products from the offers&apos; price breaks
              {b.longestLeadTimeDays !== null && b.longestLeadTimeDays !== undefined ? `; the longest lead time is ${b.longestLeadTimeDays} days` : ''}.
            </p>
            {!b.complete && (
              <Callout intent={Intent.WARNING} icon="warning-sign" compact>
                Incomplete: a radio has no chosen part or a part has no offer for this quantity, so the total leaves it out.
              </Callout>
            )}
          </>
        )}
      </QueryState>
    </section>
  );
}
