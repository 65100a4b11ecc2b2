import { useLocalSearchParams } from 'expo-router';

import { HeatsinkScreen } from '@/features/heatsinks/heatsink-screen';

export default function HeatsinkRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <HeatsinkScreen key={id} id={id} />;
}
