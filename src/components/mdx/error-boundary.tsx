import { Component, type ErrorInfo, type ReactNode } from "react";

interface Props {
  /** What to show instead of the broken part; gets the error's message. */
  fallback: (message: string, retry: () => void) => ReactNode;
  children?: ReactNode;
}

/** Keeps one broken simulation or figure from taking the whole lesson down with it. */
export class EmbedErrorBoundary extends Component<Props, { error: Error | null }> {
  override state = { error: null as Error | null };

  static getDerivedStateFromError(error: Error) {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo) {
    console.error("A lesson embed failed", error, info.componentStack);
  }

  override render() {
    if (this.state.error) return this.props.fallback(this.state.error.message, () => this.setState({ error: null }));
    return this.props.children;
  }
}
