import { useLocalSearchParams } from 'expo-router';

import { EditPartScreen } from '@/features/parts/part-edit-screen';

export default function EditPartRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <EditPartScreen key={id} id={id} />;
}
