import { useLocalSearchParams } from 'expo-router';

import { PartScreen } from '@/features/parts/part-screen';

export default function PartRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <PartScreen key={id} id={id} />;
}
