import { useLocalSearchParams } from 'expo-router';

import { RevisionScreen } from '@/features/revisions/revision-screen';

export default function RevisionRoute() {
  const { id, number } = useLocalSearchParams<{ id: string; number: string }>();
  return <RevisionScreen key={`${id}-${number}`} studyId={id} number={number} />;
}
