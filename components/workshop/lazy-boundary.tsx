import { Component, type ReactNode } from 'react';
import { Platform } from 'react-native';

import { ErrorState } from '../ui/query-states';

type Props = { children: ReactNode; what: string };
type State = { failed: boolean };

/**
 * Catches a lazily loaded part that could not be fetched (a dropped connection, a new release on the
 * server) and says so in its place, so the rest of the screen stays usable.
 */
export class LazyBoundary extends Component<Props, State> {
  state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  render() {
    if (!this.state.failed) return this.props.children;
    const reload = Platform.OS === 'web' && typeof window !== 'undefined' ? () => window.location.reload() : undefined;
    return (
      <ErrorState
        title={`The ${this.props.what} could not be loaded`}
        error={new Error('Part of this screen did not arrive. Check your connection, then reload the page.')}
        onRetry={reload}
      />
    );
  }
}
