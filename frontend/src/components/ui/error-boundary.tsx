import { Component, type ErrorInfo, type ReactNode } from 'react';
import { QueryErrorResetBoundary } from '@tanstack/react-query';
import { ErrorState } from './error-state';

interface ErrorBoundaryProps {
  children: ReactNode;
  /** What the panel is, for the message: "Your sites could not be shown". */
  title?: string;
  onReset?: () => void;
  fallback?: (props: { error: unknown; reset: () => void }) => ReactNode;
}

interface ErrorBoundaryState {
  error: unknown;
  failed: boolean;
}

/** Keeps a failure inside one panel so the rest of the page stays usable. */
export class ErrorBoundary extends Component<ErrorBoundaryProps, ErrorBoundaryState> {
  override state: ErrorBoundaryState = { error: null, failed: false };

  static getDerivedStateFromError(error: unknown): ErrorBoundaryState {
    return { error, failed: true };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error(error, info.componentStack);
  }

  reset = () => {
    this.props.onReset?.();
    this.setState({ error: null, failed: false });
  };

  override render(): ReactNode {
    if (!this.state.failed) return this.props.children;
    if (this.props.fallback) return this.props.fallback({ error: this.state.error, reset: this.reset });
    return (
      <ErrorState
        title={this.props.title ?? 'This part of the page could not be shown'}
        message="Something went wrong while showing it. Try again, or reload the page."
        onRetry={this.reset}
      />
    );
  }
}

/** An error boundary that also lets failed queries inside it run again on retry. */
export function PanelBoundary({ title, children }: { title?: string; children: ReactNode }) {
  return (
    <QueryErrorResetBoundary>
      {({ reset }) => (
        <ErrorBoundary title={title} onReset={reset}>
          {children}
        </ErrorBoundary>
      )}
    </QueryErrorResetBoundary>
  );
}
