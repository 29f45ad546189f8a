/**
 * Every client URL, once. Screens link with getHref() so a renamed path changes in one place.
 * The two e-mail paths (accept invitation, reset confirm) are fixed by the server's mail
 * templates: change them only together with the server.
 */

/** Only same-site paths may be used as a "next" target, so a crafted link cannot send a user away. */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return "/";
  return next;
}

export const paths = {
  auth: {
    signIn: {
      path: "/sign-in",
      getHref: (next?: string) =>
        next && safeNext(next) !== "/" ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in",
    },
    createAccount: { path: "/create-account", getHref: () => "/create-account" },
    resetPassword: { path: "/reset-password", getHref: () => "/reset-password" },
    resetPasswordConfirm: {
      path: "/reset-password/confirm",
      getHref: (token: string) => `/reset-password/confirm?token=${encodeURIComponent(token)}`,
    },
    acceptInvitation: {
      path: "/invitations/accept",
      getHref: (token: string) => `/invitations/accept?token=${encodeURIComponent(token)}`,
    },
  },
  app: {
    overview: { path: "/", getHref: () => "/" },
    team: { path: "/team", getHref: () => "/team" },
    outbox: { path: "/outbox", getHref: () => "/outbox" },
    designs: { path: "/designs", getHref: () => "/designs" },
    newDesign: { path: "/designs/new", getHref: () => "/designs/new" },
    design: {
      path: "/designs/:designId",
      // A revision in the URL opens that snapshot; without one the page shows the latest.
      getHref: (designId: string, revision?: number) =>
        `/designs/${encodeURIComponent(designId)}${revision ? `?revision=${revision}` : ""}`,
    },
    compare: {
      path: "/compare",
      // ids are "designId" or "designId:revision", as GET /api/compare takes them.
      getHref: (ids: string[] = []) => (ids.length > 0 ? `/compare?ids=${ids.map(encodeURIComponent).join(",")}` : "/compare"),
    },
    library: { path: "/library", getHref: (query = "") => `/library${query}` },
    libraryNew: { path: "/library/new", getHref: () => "/library/new" },
    libraryImport: { path: "/library/import", getHref: () => "/library/import" },
    cryogens: { path: "/library/cryogens", getHref: () => "/library/cryogens" },
    libraryEntry: {
      path: "/library/:id",
      getHref: (id: string, version?: number) => `/library/${encodeURIComponent(id)}${version ? `?version=${version}` : ""}`,
    },
    tests: { path: "/tests", getHref: () => "/tests" },
    newTest: { path: "/tests/new", getHref: () => "/tests/new" },
    // Fixed by the server's alert e-mail (APP_ORIGIN/tests/:id): change only together with it.
    test: { path: "/tests/:testId", getHref: (testId: string) => `/tests/${encodeURIComponent(testId)}` },
    libraryPropose: { path: "/library/:id/propose", getHref: (id: string) => `/library/${encodeURIComponent(id)}/propose` },
  },
} as const;
