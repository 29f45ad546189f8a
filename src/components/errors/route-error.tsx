import { isRouteErrorResponse, useRouteError } from "react-router-dom";
import { paths } from "../../config/paths";
import { TextLink } from "../ui/text-link";
import { ErrorMessage } from "./error-message";

/** errorElement for every route: a failing screen says so, and the way home stays open. */
export function RouteError() {
  const error = useRouteError();
  const shown = isRouteErrorResponse(error) ? new Error(`${error.status} ${error.statusText}`) : error;
  return (
    <div className="mx-auto max-w-xl space-y-4 px-4 py-12">
      <ErrorMessage error={shown} title="This screen failed" />
      <p className="text-sm">
        <TextLink to={paths.app.overview.getHref()} reloadDocument>
          Back to the overview
        </TextLink>
      </p>
    </div>
  );
}
