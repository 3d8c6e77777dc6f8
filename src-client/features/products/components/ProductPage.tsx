import { type ReactNode, useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { Alert, Button, Intent, NonIdealState, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { paths } from '../../../app/routes/paths';
import { useHasRole, useSession } from '../../../lib/session';
import { useProduct } from '../api/get-product';
import { useDeleteProduct } from '../api/delete-product';
import type { ProductDetail } from '../types';
import { ProductDialog } from './ProductDialog';
import { ProductHistory } from './ProductHistory';
import { ProductStrip } from './ProductStrip';
import { RadiosSection } from './RadiosSection';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

export interface ProductPageProps {
  /**
   * What other features put at the top of the page, under its header (the product verdict), composed in the
   * route like `extensions`. @default none
   */
  summary?: (product: ProductDetail) => ReactNode;
  /**
   * Sections other features add below the radios (the compatibility matrix), composed in the
   * route so that features never import each other. @default none
   */
  extensions?: (product: ProductDetail) => ReactNode;
}

/** One product: its facts, band plan, radios, what other features add, and its history. */
export function ProductPage({ summary, extensions }: ProductPageProps) {
  const id = Number(useParams().id);
  const product = useProduct(id);
  const canEdit = useHasRole('engineer', 'admin');
  const { user } = useSession();
  const remove = useDeleteProduct();
  const navigate = useNavigate();
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  if (!Number.isInteger(id) || id < 1) return <NonIdealState icon="search" title="No such product" />;
  const p = product.data;
  // The server allows a delete to the product's creator and to admins only.
  const canDelete = canEdit && p !== undefined && (user?.role === 'admin' || (p.createdBy !== null && p.createdBy.id === user?.id));

  return (
    <QueryState isPending={product.isPending} error={product.error}>
      {p && (
        <>
          <PageHeader
            title={p.name}
            subtitle={
              <span className="bw-facts" data-testid="product-facts">
                <Tag minimal>{p.code}</Tag> Owner {p.owner} · created by {p.createdBy?.name ?? 'unknown'} · ground plane {p.groundPlaneLengthMm} ×{' '}
                {p.groundPlaneWidthMm} mm · markets {p.targetRegions.join(', ')} · version {p.version}
              </span>
            }
            actions={
              canEdit && (
                <>
                  <Button icon="edit" text="Edit product" onClick={() => setEditing(true)} />
                  {canDelete && <Button icon="trash" intent={Intent.DANGER} variant="outlined" text="Delete" onClick={() => setDeleting(true)} />}
                </>
              )
            }
          />
          {summary?.(p)}
          {p.notes && <p className="bw-muted bw-notes">{p.notes}</p>}
          <ProductStrip product={p} />
          <RadiosSection product={p} canEdit={canEdit} />
          <ScreeningCaution compact />
          {extensions?.(p)}
          <ProductHistory productId={p.id} />
          {editing && <ProductDialog product={p} onClose={() => setEditing(false)} />}
          <Alert
            isOpen={deleting}
            intent={Intent.DANGER}
            icon="trash"
            confirmButtonText="Delete product"
            cancelButtonText="Keep it"
            loading={remove.isPending}
            onCancel={() => setDeleting(false)}
            onConfirm={() =>
              remove.mutate(
                { id: p.id, version: p.version },
                {
                  onSuccess: () => navigate(paths.products),
                  onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })),
                  onSettled: () => setDeleting(false),
                },
              )
            }
          >
            Delete <b>{p.name}</b> and its {p.radios.length} radios? It leaves the product list and the matrix; an admin can restore it with its radios and part
            choices. The history stays in the audit log.
          </Alert>
        </>
      )}
    </QueryState>
  );
}
