import { Component, type ReactNode } from 'react';

interface State {
  failed: boolean;
}

/** Last line of defence: says so plainly and offers a reload. Device data is untouched. */
export class ErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  override render() {
    if (!this.state.failed) return this.props.children;
    return (
      <div className="pl-splash" role="alert">
        <h1>Something went wrong</h1>
        <p>Interviews on this device are safe. Reload to carry on.</p>
        <button type="button" className="pl-button pl-button-main" onClick={() => window.location.reload()}>
          Reload
        </button>
      </div>
    );
  }
}
