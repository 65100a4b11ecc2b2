import { Button } from '@/components/ui';

import type { PickedStudyFile } from '../types';

export type StudyFilePickerProps = { label: string; onPick: (file: PickedStudyFile) => void; disabled?: boolean };

/** Native builds have no document picker installed: study files are imported in the web app. */
export function StudyFilePicker({ label }: StudyFilePickerProps) {
  return <Button label={label} variant="secondary" disabled accessibilityHint="Open Junctura in a web browser to import a file." />;
}
