import { useLocalSearchParams } from 'expo-router';

import { StudyScreen } from '@/features/studies/study-screen';

export default function StudyRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <StudyScreen key={id} id={id} />;
}
