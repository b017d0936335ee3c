import { Component, type ErrorInfo, type ReactNode } from 'react';

interface ErrorBoundaryProps {
  /** Rendered instead of the children after a render error; `reset` tries the children again. */
  fallback: (props: { error: unknown; reset: () => void }) => ReactNode;
  children: ReactNode;
}

interface ErrorBoundaryState {
  error: unknown;
  failed: boolean;
}

/** Catches render errors below it so one broken panel does not blank the whole app. */
export class ErrorBoundary extends Component<ErrorBoundaryProps, ErrorBoundaryState> {
  state: ErrorBoundaryState = { error: null, failed: false };

  static getDerivedStateFromError(error: unknown): ErrorBoundaryState {
    return { error, failed: true };
  }

  componentDidCatch(error: unknown, info: ErrorInfo) {
    // The browser console is the only log a client error reaches for now.
    console.error('Hourstone render error', error, info.componentStack);
  }

  reset = () => this.setState({ error: null, failed: false });

  render() {
    if (this.state.failed)
      return this.props.fallback({ error: this.state.error, reset: this.reset });
    return this.props.children;
  }
}
