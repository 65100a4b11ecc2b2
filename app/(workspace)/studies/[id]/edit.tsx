import { useLocalSearchParams } from 'expo-router';

import { StudyEditorScreen } from '@/features/study-editor/study-editor-screen';

export default function EditStudyRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <StudyEditorScreen key={id} id={id} />;
}
