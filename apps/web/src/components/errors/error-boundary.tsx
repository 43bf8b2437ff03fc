import { Component, type ErrorInfo, type ReactNode } from 'react';
import { ErrorNotice } from './error-notice';

type ErrorBoundaryProps = {
  children: ReactNode;
  /** What the panel is called, so the notice says which part of the page failed. */
  title: string;
};

type ErrorBoundaryState = { error: unknown; failed: boolean };

/**
 * Keeps one independent panel's failure inside that panel; the rest of the page keeps working.
 * React offers error boundaries only as class components.
 */
export class PanelErrorBoundary extends Component<ErrorBoundaryProps, ErrorBoundaryState> {
  override state: ErrorBoundaryState = { error: null, failed: false };

  static getDerivedStateFromError(error: unknown): ErrorBoundaryState {
    return { error, failed: true };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error(`Panel "${this.props.title}" failed`, error, info.componentStack);
  }

  override render() {
    if (this.state.failed) {
      return (
        <ErrorNotice
          title={`${this.props.title} could not be shown`}
          error={this.state.error}
          onRetry={() => this.setState({ error: null, failed: false })}
        />
      );
    }
    return this.props.children;
  }
}
