import { useCallback, useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button, Intent, NonIdealState } from '@blueprintjs/core';
import { Cell, Column, Table, TruncatedFormat } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { paths } from '../../../app/routes/paths';
import { useHasRole } from '../../../lib/session';
import { useProducts } from '../api/get-products';
import type { ProductSummary } from '../types';
import { ProductDialog } from './ProductDialog';

const COLUMNS: { id: string; name: string; width: number; value: (p: ProductSummary) => string }[] = [
  { id: 'name', name: 'Product', width: 300, value: (p) => p.name },
  { id: 'code', name: 'Code', width: 130, value: (p) => p.code },
  { id: 'owner', name: 'Owner', width: 150, value: (p) => p.owner },
  { id: 'ground', name: 'Ground plane (mm)', width: 150, value: (p) => `${p.groundPlaneLengthMm} × ${p.groundPlaneWidthMm}` },
  { id: 'regions', name: 'Markets', width: 130, value: (p) => p.targetRegions.join(', ') },
  { id: 'radios', name: 'Radios', width: 260, value: (p) => `${p.radioCount}${p.technologies.length ? ` (${p.technologies.join(', ')})` : ''}` },
  { id: 'updated', name: 'Updated (UTC)', width: 150, value: (p) => p.updatedAt.replace('T', ' ').slice(0, 16) },
];

/** Every product; engineers and admins create new ones here. */
export function ProductsPage() {
  const canEdit = useHasRole('engineer', 'admin');
  const products = useProducts();
  const navigate = useNavigate();
  const rows = useMemo(() => products.data ?? [], [products.data]);
  const [creating, setCreating] = useState(false);
  const getCellData = useCallback((row: number, col: number) => COLUMNS[col].value(rows[row]), [rows]);
  const renderers = useMemo(
    () => COLUMNS.map((c, col) => (row: number) => (
      c.id === 'name'
        ? <Cell interactive><Link to={paths.product(rows[row].id)}>{getCellData(row, col)}</Link></Cell>
        : <Cell><TruncatedFormat detectTruncation>{getCellData(row, col)}</TruncatedFormat></Cell>
    )),
    [getCellData, rows],
  );

  return (
    <>
      <PageHeader
        title="Products"
        subtitle="Devices under design: their ground plane, markets and radios."
        actions={canEdit && <Button icon="add" intent={Intent.PRIMARY} text="New product" onClick={() => setCreating(true)} />}
      />
      <QueryState isPending={products.isPending} error={products.error}>
        {rows.length === 0 ? <NonIdealState icon="box" title="No products yet" /> : (
          <div className="bw-table-wrap" data-testid="products-table">
            <Table numRows={rows.length} defaultRowHeight={32} columnWidths={COLUMNS.map((c) => c.width)} getCellClipboardData={getCellData}>
              {COLUMNS.map((c, i) => <Column key={c.id} id={c.id} name={c.name} cellRenderer={renderers[i]} />)}
            </Table>
          </div>
        )}
      </QueryState>
      {creating && <ProductDialog product={null} onClose={() => setCreating(false)} onSaved={(p) => navigate(paths.product(p.id))} />}
    </>
  );
}
