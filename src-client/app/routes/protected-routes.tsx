import type { RouteObject } from 'react-router-dom';
import { paths } from './paths';
import { RequireAuth } from '../RequireAuth';

/** Pages inside the app shell, each loaded on first visit (route-level code splitting). */
export const protectedRoutes: RouteObject[] = [
  {
    path: paths.products,
    lazy: async () => {
      const { ProductsPage } = await import('../../features/products/components/ProductsPage');
      return { element: <ProductsPage /> };
    },
  },
  {
    path: paths.product(':id'),
    lazy: async () => {
      const [{ ProductPage }, { CompatibilityMatrix }, { ProductVerdict }, { BillOfMaterials }, { InProductSection }] = await Promise.all([
        import('../../features/products/components/ProductPage'),
        import('../../features/compatibility/components/CompatibilityMatrix'),
        import('../../features/compatibility/components/ProductVerdict'),
        import('../../features/compatibility/components/BillOfMaterials'),
        import('../../features/in-product/components/InProductSection'),
      ]);
      // Other features add product sections through ProductPage's `summary` and `extensions` props, composed here.
      return {
        element: (
          <ProductPage
            summary={(product) => <ProductVerdict productId={product.id} />}
            extensions={(product) => (
              <>
                <CompatibilityMatrix productId={product.id} antennaRoles={Object.fromEntries(product.radios.map((r) => [r.id, r.antennaRoles]))} />
                <BillOfMaterials productId={product.id} />
                <InProductSection productId={product.id} radios={product.radios} />
              </>
            )}
          />
        ),
      };
    },
  },
  {
    path: paths.bands,
    lazy: async () => {
      const { BandLibraryPage } = await import('../../features/bands/components/BandLibraryPage');
      return { element: <BandLibraryPage /> };
    },
  },
  {
    path: paths.bandSets,
    lazy: async () => {
      const { BandSetsPage } = await import('../../features/bands/components/BandSetsPage');
      return { element: <BandSetsPage /> };
    },
  },
  {
    path: paths.regulatoryLimits,
    lazy: async () => {
      const { RegulatoryLimitsPage } = await import('../../features/regulatory/components/RegulatoryLimitsPage');
      return { element: <RegulatoryLimitsPage /> };
    },
  },
  {
    path: paths.rules,
    lazy: async () => {
      const { RulesPage } = await import('../../features/rules/components/RulesPage');
      return {
        element: (
          <RequireAuth roles={['admin', 'engineer']}>
            <RulesPage />
          </RequireAuth>
        ),
      };
    },
  },
  {
    path: paths.users,
    lazy: async () => {
      const { UsersPage } = await import('../../features/users/components/UsersPage');
      return {
        element: (
          <RequireAuth roles={['admin']}>
            <UsersPage />
          </RequireAuth>
        ),
      };
    },
  },
  {
    path: paths.audit,
    lazy: async () => {
      const { AuditLogPage } = await import('../../features/audit/components/AuditLogPage');
      return {
        element: (
          <RequireAuth roles={['admin']}>
            <AuditLogPage />
          </RequireAuth>
        ),
      };
    },
  },
  {
    path: paths.tools,
    lazy: async () => {
      const { ToolsPage } = await import('../../features/rf-tools/components/ToolsPage');
      return {
        element: (
          <RequireAuth>
            <ToolsPage />
          </RequireAuth>
        ),
      };
    },
  },
  {
    path: paths.catalogue,
    lazy: async () => {
      const { CataloguePage } = await import('../../features/parts/components/CataloguePage');
      return {
        element: (
          <RequireAuth>
            <CataloguePage />
          </RequireAuth>
        ),
      };
    },
  },
  {
    path: paths.reviewQueue,
    lazy: async () => {
      const { ReviewQueuePage } = await import('../../features/parts/components/ReviewQueuePage');
      return {
        element: (
          <RequireAuth roles={['admin']}>
            <ReviewQueuePage />
          </RequireAuth>
        ),
      };
    },
  },
  {
    path: paths.part(':id'),
    lazy: async () => {
      const { PartPage } = await import('../../features/parts/components/PartPage');
      return {
        element: (
          <RequireAuth>
            <PartPage />
          </RequireAuth>
        ),
      };
    },
  },
];
