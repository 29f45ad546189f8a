import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { useMemo, type ComponentType } from "react";
import { createBrowserRouter, RouterProvider, type LoaderFunction } from "react-router-dom";
import { RouteError } from "../components/errors/route-error";
import { paths } from "../config/paths";
import { FirstLoad, RootLayout } from "./root-layout";

/** What a screen module in app/routes exports: its component and, if it needs data, a loader. */
type RouteModule = { default: ComponentType; clientLoader?: (queryClient: QueryClient) => LoaderFunction };

// Each screen is its own chunk; its loader gets the query client so it can prime the cache.
const screen = (queryClient: QueryClient, load: () => Promise<RouteModule>) => async () => {
  const { default: Component, clientLoader } = await load();
  return clientLoader ? { Component, loader: clientLoader(queryClient) } : { Component };
};

export function createAppRouter(queryClient: QueryClient) {
  const lazy = (load: () => Promise<RouteModule>) => screen(queryClient, load);
  const errorElement = <RouteError />;
  return createBrowserRouter([
    {
      Component: RootLayout,
      hydrateFallbackElement: <FirstLoad />,
      errorElement,
      children: [
        { path: paths.auth.signIn.path, lazy: lazy(() => import("./routes/auth/sign-in")), errorElement },
        { path: paths.auth.createAccount.path, lazy: lazy(() => import("./routes/auth/create-account")), errorElement },
        { path: paths.auth.resetPassword.path, lazy: lazy(() => import("./routes/auth/reset-password")), errorElement },
        { path: paths.auth.resetPasswordConfirm.path, lazy: lazy(() => import("./routes/auth/reset-password-confirm")), errorElement },
        { path: paths.auth.acceptInvitation.path, lazy: lazy(() => import("./routes/auth/accept-invitation")), errorElement },
        {
          // The signed-in shell: its loader is the session guard for every child.
          path: paths.app.overview.path,
          lazy: lazy(() => import("./routes/app/root")),
          errorElement,
          children: [
            { index: true, lazy: lazy(() => import("./routes/app/overview")), errorElement },
            { path: paths.app.team.path, lazy: lazy(() => import("./routes/app/team")), errorElement },
            { path: paths.app.outbox.path, lazy: lazy(() => import("./routes/app/outbox")), errorElement },
            { path: paths.app.designs.path, lazy: lazy(() => import("./routes/designs/designs")), errorElement },
            { path: paths.app.newDesign.path, lazy: lazy(() => import("./routes/designs/new-design")), errorElement, handle: { wide: true } },
            // handle.wide: the form and its live results sit side by side at full width.
            { path: paths.app.design.path, lazy: lazy(() => import("./routes/designs/design")), errorElement, handle: { wide: true } },
            { path: paths.app.compare.path, lazy: lazy(() => import("./routes/compare")), errorElement },
            { path: paths.app.library.path, lazy: lazy(() => import("./routes/library/materials")), errorElement },
            { path: paths.app.libraryNew.path, lazy: lazy(() => import("./routes/library/new-material")), errorElement },
            { path: paths.app.libraryImport.path, lazy: lazy(() => import("./routes/library/import")), errorElement },
            { path: paths.app.cryogens.path, lazy: lazy(() => import("./routes/library/cryogens")), errorElement },
            { path: paths.app.libraryEntry.path, lazy: lazy(() => import("./routes/library/material")), errorElement },
            { path: paths.app.tests.path, lazy: lazy(() => import("./routes/boil-off-tests/boil-off-tests")), errorElement },
            { path: paths.app.newTest.path, lazy: lazy(() => import("./routes/boil-off-tests/new-boil-off-test")), errorElement },
            { path: paths.app.test.path, lazy: lazy(() => import("./routes/boil-off-tests/boil-off-test")), errorElement, handle: { wide: true } },
            { path: paths.app.libraryPropose.path, lazy: lazy(() => import("./routes/library/propose-change")), errorElement },
          ],
        },
        { path: "*", lazy: lazy(() => import("./routes/not-found")) },
      ],
    },
  ]);
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const router = useMemo(() => createAppRouter(queryClient), [queryClient]);
  return <RouterProvider router={router} />;
}
