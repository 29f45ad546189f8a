import { isApiError } from "../../lib/api-client";
import { Callout } from "../ui/callout";

/** Says what failed in words, with the request id when the server gave one (never a stack). */
export function ErrorMessage({ error, title = "This did not load" }: { error: unknown; title?: string }) {
  const message = error instanceof Error ? error.message : "Something went wrong.";
  return (
    <Callout tone="error" title={title}>
      <p>{message}</p>
      {isApiError(error) && error.requestId ? (
        <p className="mt-1 font-mono text-xs">Request id: {error.requestId}</p>
      ) : null}
    </Callout>
  );
}
