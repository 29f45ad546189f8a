import { ErrorMessage } from "../../../components/errors/error-message";
import { isApiError } from "../../../lib/api-client";

/**
 * A refused log: the message, then every problem the server listed (line and column), since
 * the message itself shows only the first five.
 */
export function LogProblems({ error, title }: { error: unknown; title: string }) {
  const issues = isApiError(error) ? error.fields : [];
  return (
    <div className="space-y-2">
      <ErrorMessage error={error} title={title} />
      {issues.length > 1 ? (
        <ul aria-label="Problems in the file" className="max-h-48 list-disc overflow-auto pl-5 text-sm text-fault-200">
          {issues.map((f, i) => (
            <li key={`${i}-${f.path}`}>
              <span className="font-mono text-xs">{f.path}</span>: {f.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
