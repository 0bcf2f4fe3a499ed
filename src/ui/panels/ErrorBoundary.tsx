import { Component } from 'react';
import type { ReactNode } from 'react';

interface Props {
  /** The panel's name, used in the fallback's heading. */
  readonly name: string;
  readonly children: ReactNode;
}

interface State {
  readonly message: string | null;
}

/** Keeps one failing panel from blanking the page: shows what went wrong and offers to try again. */
export class ErrorBoundary extends Component<Props, State> {
  override state: State = { message: null };

  static getDerivedStateFromError(error: unknown): State {
    return { message: error instanceof Error ? error.message : String(error) };
  }

  override render(): ReactNode {
    if (this.state.message === null) return this.props.children;
    return (
      <section className="panel" role="alert" aria-label={`${this.props.name} failed`}>
        <h2>{this.props.name} could not be shown</h2>
        <p className="alert-message">{this.state.message}</p>
        <button type="button" onClick={() => this.setState({ message: null })}>
          Try again
        </button>
      </section>
    );
  }
}
