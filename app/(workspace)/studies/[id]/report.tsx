import { useLocalSearchParams } from 'expo-router';

import { ReportScreen } from '@/features/report/report-screen';

export default function StudyReportRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <ReportScreen key={id} id={id} />;
}
