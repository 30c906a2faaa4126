import { Navigate, type RouteObject } from 'react-router-dom';
import { RequireRoles } from '../features/auth/components/RequireRoles';
import { RequireSession } from '../features/auth/components/RequireSession';
import { sectionRoles } from '../features/auth/utils/section-roles';
import { PageLoading } from '../features/shell/components/PageLoading';
import { RouteErrorPage } from '../features/shell/components/RouteErrorPage';

/**
 * Every page is its own chunk (`lazy`), so the sign-in page loads without the shell, the
 * tables or the icons of the sections. The role guards read the same table as the navigation.
 */
export const appRoutes: RouteObject[] = [
  {
    path: '/sign-in',
    errorElement: <RouteErrorPage />,
    hydrateFallbackElement: <PageLoading />,
    lazy: () => import('../features/auth/components/SignInPage').then((m) => ({ Component: m.SignInPage })),
  },
  {
    path: '/accept-invite',
    errorElement: <RouteErrorPage />,
    hydrateFallbackElement: <PageLoading />,
    lazy: () => import('../features/auth/components/AcceptInvitePage').then((m) => ({ Component: m.AcceptInvitePage })),
  },
  {
    path: '/reset-password',
    errorElement: <RouteErrorPage />,
    hydrateFallbackElement: <PageLoading />,
    lazy: () => import('../features/auth/components/ResetPasswordPage').then((m) => ({ Component: m.ResetPasswordPage })),
  },
  {
    path: '/forgot-password',
    errorElement: <RouteErrorPage />,
    hydrateFallbackElement: <PageLoading />,
    lazy: () => import('../features/auth/components/ForgotPasswordPage').then((m) => ({ Component: m.ForgotPasswordPage })),
  },
  {
    path: '/',
    element: <RequireSession />,
    errorElement: <RouteErrorPage />,
    hydrateFallbackElement: <PageLoading />,
    children: [
      {
        lazy: () => import('../features/shell/components/AppShell').then((m) => ({ Component: m.AppShell })),
        children: [
          {
            // Errors inside a section keep the top bar and navigation on screen.
            errorElement: <RouteErrorPage />,
            children: [
              { index: true, element: <Navigate to="/builds" replace /> },
              {
                element: <RequireRoles anyOf={sectionRoles.builds} />,
                children: [
                  {
                    path: 'builds',
                    lazy: () =>
                      import('../features/builds/components/BuildsPage').then((m) => ({ Component: m.BuildsPage })),
                  },
                  {
                    path: 'builds/:buildId',
                    lazy: () =>
                      import('../features/builds/components/BuildPage').then((m) => ({ Component: m.BuildPage })),
                  },
                  {
                    path: 'circuits/:circuitId',
                    lazy: () =>
                      import('../features/circuits/components/CircuitPage').then((m) => ({ Component: m.CircuitPage })),
                  },
                  {
                    path: 'circuits/:circuitId/compare',
                    lazy: () =>
                      import('../features/reviews/components/ComparePage').then((m) => ({ Component: m.ComparePage })),
                  },
                  {
                    path: 'circuits/:circuitId/revisions/:number/sheet',
                    lazy: () =>
                      import('../features/shop-sheet/components/ShopSheetPage').then((m) => ({ Component: m.ShopSheetPage })),
                  },
                ],
              },
              {
                element: <RequireRoles anyOf={sectionRoles.reviews} />,
                children: [
                  {
                    path: 'reviews',
                    lazy: () =>
                      import('../features/reviews/components/ReviewsPage').then((m) => ({ Component: m.ReviewsPage })),
                  },
                  {
                    path: 'reviews/:circuitId',
                    lazy: () =>
                      import('../features/reviews/components/ReviewPage').then((m) => ({ Component: m.ReviewPage })),
                  },
                ],
              },
              {
                element: <RequireRoles anyOf={sectionRoles.orders} />,
                children: [
                  {
                    path: 'orders',
                    lazy: () =>
                      import('../features/orders/components/OrdersPage').then((m) => ({ Component: m.OrdersPage })),
                  },
                  {
                    path: 'orders/:orderId',
                    lazy: () =>
                      import('../features/orders/components/OrderPage').then((m) => ({ Component: m.OrderPage })),
                  },
                ],
              },
              {
                element: <RequireRoles anyOf={sectionRoles.catalogue} />,
                children: [
                  {
                    path: 'catalogue',
                    lazy: () =>
                      import('../features/catalogue/components/CataloguePage').then((m) => ({
                        Component: m.CataloguePage,
                      })),
                  },
                ],
              },
              {
                element: <RequireRoles anyOf={sectionRoles.reference} />,
                children: [
                  {
                    path: 'reference',
                    lazy: () =>
                      import('../features/reference/components/ReferencePage').then((m) => ({
                        Component: m.ReferencePage,
                      })),
                  },
                ],
              },
              {
                path: 'admin',
                element: <RequireRoles anyOf={sectionRoles.admin} />,
                children: [
                  {
                    lazy: () =>
                      import('../features/admin/components/AdminSection').then((m) => ({ Component: m.AdminSection })),
                    children: [
                      { index: true, element: <Navigate to="/admin/users" replace /> },
                      {
                        path: 'users',
                        lazy: () =>
                          import('../features/users/components/UsersPage').then((m) => ({ Component: m.UsersPage })),
                      },
                      {
                        path: 'shop-profile',
                        lazy: () =>
                          import('../features/shop-profile/components/ShopProfilePage').then((m) => ({
                            Component: m.ShopProfilePage,
                          })),
                      },
                      {
                        path: 'shop-rules',
                        lazy: () =>
                          import('../features/shop-rules/components/ShopRulesPage').then((m) => ({
                            Component: m.ShopRulesPage,
                          })),
                      },
                      {
                        path: 'outbox',
                        lazy: () =>
                          import('../features/outbox/components/OutboxPage').then((m) => ({ Component: m.OutboxPage })),
                      },
                    ],
                  },
                ],
              },
              {
                path: '*',
                lazy: () =>
                  import('../features/shell/components/NotFoundPage').then((m) => ({ Component: m.NotFoundPage })),
              },
            ],
          },
        ],
      },
    ],
  },
];
