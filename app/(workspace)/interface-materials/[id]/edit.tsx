import { useLocalSearchParams } from 'expo-router';

import { EditInterfaceMaterialScreen } from '@/features/interface-materials/interface-edit-screen';

export default function EditInterfaceMaterialRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <EditInterfaceMaterialScreen key={id} id={id} />;
}
