import { Component, type ErrorInfo, type ReactNode } from "react";
import { ErrorMessage } from "./error-message";

type State = { error: unknown };

/** Last line of defence above the router: anything thrown outside a route still ends readable. */
export class ErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: unknown): State {
    return { error };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo) {
    console.error("Frostfold crashed", error, info.componentStack);
  }

  override render() {
    if (this.state.error === null) return this.props.children;
    return (
      <div className="mx-auto max-w-xl space-y-4 px-4 py-12">
        <ErrorMessage error={this.state.error} title="Frostfold stopped" />
        <button type="button" className="text-sm text-frost-300 underline" onClick={() => window.location.reload()}>
          Reload the page
        </button>
      </div>
    );
  }
}
