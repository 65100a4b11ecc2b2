import { useLocalSearchParams } from 'expo-router';

import { InterfaceMaterialScreen } from '@/features/interface-materials/interface-material-screen';

export default function InterfaceMaterialRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <InterfaceMaterialScreen key={id} id={id} />;
}
