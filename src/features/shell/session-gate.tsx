import { Redirect } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { ErrorState, LoadingState } from '@/components/ui';
import { color, size, spacing } from '@/constants/theme';
import { useSession } from '@/features/auth/api';
import type { Session } from '@/features/auth/types';

export type SessionGateProps = {
  /** Who may see the children: signed-in users (workspace) or signed-out visitors (sign-in, sign-up). */
  require: 'signed-in' | 'signed-out';
  children: (session: Session | null) => ReactNode;
};

/** Waits for the session check, then shows the children or redirects to where the user belongs. */
export function SessionGate({ require, children }: SessionGateProps) {
  const session = useSession();

  if (session.isPending) {
    return (
      <View style={styles.centre}>
        <LoadingState label="Checking your session…" />
      </View>
    );
  }
  if (session.isError) {
    return (
      <View style={styles.centre}>
        <View style={styles.narrow}>
          <ErrorState
            title="Could not reach Junctura"
            message={errorMessage(session.error)}
            onRetry={() => session.refetch()}
            retrying={session.isFetching}
          />
        </View>
      </View>
    );
  }
  if (require === 'signed-in' && !session.data) return <Redirect href="/sign-in" />;
  if (require === 'signed-out' && session.data) return <Redirect href="/" />;
  return <>{children(session.data)}</>;
}

const styles = StyleSheet.create({
  centre: { flex: 1, justifyContent: 'center', alignItems: 'center', padding: spacing.lg, backgroundColor: color.canvas },
  narrow: { width: '100%', maxWidth: size.formMaxWidth },
});
