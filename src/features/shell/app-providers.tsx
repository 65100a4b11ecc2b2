import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { ThemeProvider } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import type { ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { navigationTheme } from '@/constants/theme';

export type AppProvidersProps = { queryClient: QueryClient; children: ReactNode };

/** Everything a screen expects above it: query cache, safe-area insets and the theme. */
export function AppProviders({ queryClient, children }: AppProvidersProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <SafeAreaProvider>
        <ThemeProvider value={navigationTheme}>
          <StatusBar style="dark" />
          {children}
        </ThemeProvider>
      </SafeAreaProvider>
    </QueryClientProvider>
  );
}
