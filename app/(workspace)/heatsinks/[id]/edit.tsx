import { useLocalSearchParams } from 'expo-router';

import { EditHeatsinkScreen } from '@/features/heatsinks/heatsink-edit-screen';

export default function EditHeatsinkRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <EditHeatsinkScreen key={id} id={id} />;
}
