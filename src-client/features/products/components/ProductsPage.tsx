import { useCallback, useMemo, useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Button, H5, HTMLTable, Intent, NonIdealState, OverlayToaster, Position, Switch } from '@blueprintjs/core';
import { Cell, Column, Table, TruncatedFormat } from '@blueprintjs/table';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { paths } from '../../../app/routes/paths';
import { useHasRole } from '../../../lib/session';
import { useDeletedProducts, useProducts } from '../api/get-products';
import { useRestoreProduct } from '../api/restore-product';
import { type ProductSummary, TECHNOLOGY_SHORT_LABELS } from '../types';
import { ProductDialog } from './ProductDialog';

const COLUMNS: { id: string; name: string; width: number; value: (p: ProductSummary) => string }[] = [
  { id: 'name', name: 'Product', width: 300, value: (p) => p.name },
  { id: 'code', name: 'Code', width: 130, value: (p) => p.code },
  { id: 'owner', name: 'Owner', width: 150, value: (p) => p.owner },
  { id: 'ground', name: 'Ground plane (mm)', width: 150, value: (p) => `${p.groundPlaneLengthMm} × ${p.groundPlaneWidthMm}` },
  { id: 'regions', name: 'Markets', width: 130, value: (p) => p.targetRegions.join(', ') },
  {
    id: 'radios',
    name: 'Radios',
    width: 260,
    value: (p) => `${p.radioCount}${p.technologies.length ? ` (${p.technologies.map((t) => TECHNOLOGY_SHORT_LABELS[t] ?? t).join(', ')})` : ''}`,
  },
  { id: 'updated', name: 'Updated (UTC)', width: 150, value: (p) => p.updatedAt.replace('T', ' ').slice(0, 16) },
];

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

const whenUtc = (iso: string | null) => (iso ? iso.replace('T', ' ').slice(0, 16) : '');

/** Deleted products with who deleted them and when; an admin brings one back with its radios and part choices. */
function DeletedProducts() {
  const deleted = useDeletedProducts(true);
  const restore = useRestoreProduct();
  const rows = deleted.data ?? [];
  return (
    <QueryState isPending={deleted.isPending} error={deleted.error}>
      <H5 className="bw-gap">Deleted products</H5>
      {rows.length === 0 ? (
        <NonIdealState icon="trash" title="No deleted products" />
      ) : (
        <HTMLTable compact striped className="bw-gap" data-testid="deleted-products">
          <thead>
            <tr>
              <th>Product</th>
              <th>Code</th>
              <th>Radios</th>
              <th>Deleted (UTC)</th>
              <th>Deleted by</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.map((p) => (
              <tr key={p.id}>
                <td>{p.name}</td>
                <td>{p.code}</td>
                <td>{p.radioCount}</td>
                <td>{whenUtc(p.deletedAt)}</td>
                <td>{p.deletedBy?.name ?? 'unknown'}</td>
                <td>
                  <Button
                    size="small"
                    icon="undo"
                    text="Restore"
                    loading={restore.isPending && restore.variables === p.id}
                    onClick={() => restore.mutate(p.id, { onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })) })}
                  />
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
    </QueryState>
  );
}

/** Every product; engineers and admins create new ones here, admins also see and restore deleted ones. */
export function ProductsPage() {
  const canEdit = useHasRole('engineer', 'admin');
  const isAdmin = useHasRole('admin');
  // In the URL, so that the choice survives reload and Back.
  const [searchParams, setSearchParams] = useSearchParams();
  const showDeleted = searchParams.get('deleted') === '1';
  const setShowDeleted = (on: boolean) =>
    setSearchParams((prev) => {
      const next = new URLSearchParams(prev);
      if (on) next.set('deleted', '1');
      else next.delete('deleted');
      return next;
    });
  const products = useProducts();
  const navigate = useNavigate();
  const rows = useMemo(() => products.data ?? [], [products.data]);
  const [creating, setCreating] = useState(false);
  const getCellData = useCallback((row: number, col: number) => COLUMNS[col].value(rows[row]), [rows]);
  const renderers = useMemo(
    () =>
      COLUMNS.map(
        (c, col) => (row: number) =>
          c.id === 'name' ? (
            <Cell interactive>
              <Link to={paths.product(rows[row].id)}>{getCellData(row, col)}</Link>
            </Cell>
          ) : (
            <Cell>
              <TruncatedFormat detectTruncation>{getCellData(row, col)}</TruncatedFormat>
            </Cell>
          ),
      ),
    [getCellData, rows],
  );

  return (
    <>
      <PageHeader
        title="Products"
        subtitle="Devices under design: their ground plane, markets and radios."
        actions={
          (isAdmin || canEdit) && (
            <>
              {isAdmin && <Switch inline label="Show deleted" checked={showDeleted} onChange={(e) => setShowDeleted(e.currentTarget.checked)} />}
              {canEdit && <Button icon="add" intent={Intent.PRIMARY} text="New product" onClick={() => setCreating(true)} />}
            </>
          )
        }
      />
      {isAdmin && showDeleted && <DeletedProducts />}
      {isAdmin && showDeleted && <H5 className="bw-gap">Current products</H5>}
      <QueryState isPending={products.isPending} error={products.error}>
        {rows.length === 0 ? (
          <NonIdealState icon="box" title="No products yet" />
        ) : (
          <div className="bw-table-wrap" data-testid="products-table">
            <Table numRows={rows.length} defaultRowHeight={32} columnWidths={COLUMNS.map((c) => c.width)} getCellClipboardData={getCellData}>
              {COLUMNS.map((c, i) => (
                <Column key={c.id} id={c.id} name={c.name} cellRenderer={renderers[i]} />
              ))}
            </Table>
          </div>
        )}
      </QueryState>
      {creating && <ProductDialog product={null} onClose={() => setCreating(false)} onSaved={(p) => navigate(paths.product(p.id))} />}
    </>
  );
}
