import { IBMPlexMono_400Regular, IBMPlexMono_500Medium } from '@expo-google-fonts/ibm-plex-mono';
import {
  IBMPlexSans_400Regular,
  IBMPlexSans_500Medium,
  IBMPlexSans_600SemiBold,
  IBMPlexSans_700Bold,
  useFonts,
} from '@expo-google-fonts/ibm-plex-sans';
import { Slot } from 'expo-router';

import { createQueryClient } from '@/api';
import { AppProviders } from '@/features/shell/app-providers';

export { ErrorBoundary } from 'expo-router';

const queryClient = createQueryClient();

export default function RootLayout() {
  // The font files ship inside the bundle, so this resolves without the network.
  const [loaded, failed] = useFonts({
    IBMPlexSans_400Regular,
    IBMPlexSans_500Medium,
    IBMPlexSans_600SemiBold,
    IBMPlexSans_700Bold,
    IBMPlexMono_400Regular,
    IBMPlexMono_500Medium,
  });
  // Render with system fonts rather than a blank screen if a font cannot load.
  if (!loaded && !failed) return null;

  return (
    <AppProviders queryClient={queryClient}>
      <Slot />
    </AppProviders>
  );
}
