import { Button, Text } from '@/components/ui';

import type { PickedFile } from '../types';

export type FilePickerProps = { label: string; onPick: (file: PickedFile) => void; disabled?: boolean };

/** Native builds have no document picker installed: importing a file is done in the web app. */
export function FilePicker({ label }: FilePickerProps) {
  return (
    <>
      <Button label={label} variant="secondary" disabled />
      <Text variant="caption" tone="muted">
        Open Junctura in a web browser to import a file.
      </Text>
    </>
  );
}
