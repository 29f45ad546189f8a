import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Navigate, Outlet, redirect, useLocation, useMatches, useNavigate, type LoaderFunctionArgs } from "react-router-dom";
import { can } from "../../../../shared/permissions";
import type { Me } from "../../../../shared/schemas/auth";
import { ErrorMessage } from "../../../components/errors/error-message";
import { AppLayout, type NavItem } from "../../../components/layouts/app-layout";
import { Loading } from "../../../components/ui/spinner";
import { paths } from "../../../config/paths";
import { meQueryOptions, useMe } from "../../../features/auth/api/get-me";
import { useSignOut } from "../../../features/auth/api/sign-out";
import { UnitSwitch } from "../../../features/auth/components/unit-switch";
import { RoleProvider } from "../../../lib/can";
import { UnitSystemProvider } from "../../../lib/unit-system";

/** The session guard: a signed-out visitor goes to sign in, and comes back here after. */
export const clientLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (!me) {
    const url = new URL(request.url);
    throw redirect(paths.auth.signIn.getHref(url.pathname + url.search));
  }
  return null;
};

// Screens still to come stay visible but inert, so the shape of the product is clear.
function navFor(me: Me): NavItem[] {
  return [
    { label: "Overview", to: paths.app.overview.getHref() },
    { label: "Designs", to: paths.app.designs.getHref() },
    { label: "Compare", to: paths.app.compare.getHref() },
    { label: "Library", to: paths.app.library.getHref() },
    { label: "Tests", to: paths.app.tests.getHref() },
    { label: "Team", to: paths.app.team.getHref() },
    ...(me.localMail && can(me.role, "read:outbox") ? [{ label: "Outbox", to: paths.app.outbox.getHref() }] : []),
  ];
}

export default function AppRoot() {
  const me = useMe();
  const location = useLocation();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const signOut = useSignOut();
  const [signOutError, setSignOutError] = useState<string | null>(null);
  // A route asks for the full width with handle: { wide: true } (the Design page's form and results).
  const wide = useMatches().some((m) => (m.handle as { wide?: boolean } | undefined)?.wide === true);

  if (me.error) return <div className="mx-auto max-w-xl p-8"><ErrorMessage error={me.error} title="Could not load your session" /></div>;
  if (me.isPending) return <Loading />;
  // The query drives the guard too: a 401 anywhere writes null here and lands on sign-in.
  if (!me.data) return <Navigate to={paths.auth.signIn.getHref(location.pathname + location.search)} replace />;

  const onSignOut = async () => {
    setSignOutError(null);
    try {
      await signOut.mutateAsync();
      // Leave the signed-in screens first, then forget their data (see sign-out.ts).
      await navigate(paths.auth.signIn.getHref(), { replace: true });
      queryClient.removeQueries();
    } catch (error) {
      setSignOutError(error instanceof Error ? error.message : "Sign-out failed. Try again.");
    }
  };

  const user = { name: me.data.user.name, organization: me.data.organization.name, role: me.data.role };
  return (
    <RoleProvider role={me.data.role}>
      <UnitSystemProvider system={me.data.user.unitSystem}>
        <AppLayout
          nav={navFor(me.data)}
          user={user}
          onSignOut={onSignOut}
          signingOut={signOut.isPending}
          signOutError={signOutError}
          accountControls={<UnitSwitch current={me.data.user.unitSystem} />}
          wide={wide}
        >
          <Outlet />
        </AppLayout>
      </UnitSystemProvider>
    </RoleProvider>
  );
}
