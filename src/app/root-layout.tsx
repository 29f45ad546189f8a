import { Outlet, ScrollRestoration, useNavigation } from "react-router-dom";
import { Loading } from "../components/ui/spinner";

/** Wraps every screen: a thin bar while the next screen's code or data loads. */
export function RootLayout() {
  const navigation = useNavigation();
  return (
    <>
      {navigation.state !== "idle" ? (
        <div role="progressbar" aria-label="Loading the next screen" className="fixed inset-x-0 top-0 z-20 h-0.5 animate-pulse bg-frost-400" />
      ) : null}
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Shown once, while the first screen's code and session load. */
export function FirstLoad() {
  return (
    <div className="mx-auto max-w-md px-4 py-20">
      <Loading label="Opening Frostfold…" />
    </div>
  );
}
