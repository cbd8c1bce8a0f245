import { Component, type ErrorInfo, type ReactNode } from 'react';

type Props = {
  children: ReactNode;
  fallback: (props: { error: unknown; reset: () => void }) => ReactNode;
  /** When any of these change, a shown fallback gives way to the children again. */
  resetKeys?: readonly unknown[];
};

type State = { error: unknown; hasError: boolean; keys: readonly unknown[] };

export class ErrorBoundary extends Component<Props, State> {
  override state: State = { error: null, hasError: false, keys: this.props.resetKeys ?? [] };

  static getDerivedStateFromError(error: unknown): Partial<State> {
    return { error, hasError: true };
  }

  static getDerivedStateFromProps(props: Props, state: State): Partial<State> | null {
    const keys = props.resetKeys ?? [];
    const changed = keys.length !== state.keys.length || keys.some((key, index) => !Object.is(key, state.keys[index]));
    if (!changed) return null;
    return { keys, ...(state.hasError ? { hasError: false, error: null } : {}) };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo) {
    console.error('Rendering failed', error, info.componentStack);
  }

  reset = () => this.setState({ hasError: false, error: null });

  override render() {
    if (this.state.hasError) return this.props.fallback({ error: this.state.error, reset: this.reset });
    return this.props.children;
  }
}
