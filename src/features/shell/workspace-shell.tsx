import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { useIsWide } from '@/components/ui';
import { color } from '@/constants/theme';
import { useSignOut } from '@/features/auth/api';
import type { Session } from '@/features/auth/types';

import { BottomNav } from './components/bottom-nav';
import { Sidebar } from './components/sidebar';
import { TopBar } from './components/top-bar';

export type WorkspaceShellProps = { session: Session; children: ReactNode };

/** Phone: top bar, one column, bottom navigation. Wide windows: sidebar and a wider content area. */
export function WorkspaceShell({ session, children }: WorkspaceShellProps) {
  const wide = useIsWide();
  const signOut = useSignOut();

  if (wide) {
    return (
      <View style={styles.wide}>
        <Sidebar session={session} onSignOut={() => signOut.mutate()} signingOut={signOut.isPending} />
        <View role="main" style={styles.content}>
          {children}
        </View>
      </View>
    );
  }
  return (
    <View style={styles.phone}>
      <TopBar />
      <View role="main" style={styles.content}>
        {children}
      </View>
      <BottomNav />
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row', backgroundColor: color.canvas },
  phone: { flex: 1, backgroundColor: color.canvas },
  content: { flex: 1 },
});
