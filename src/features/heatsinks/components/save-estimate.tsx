import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { useCurrentTeam } from '@/features/team/current-team';

import { useSaveHeatsink } from '../api';
import { readField } from '../geometry-fields';

export type SaveEstimateProps = {
  defaultName: string;
  /** The POST body for a name and a reference rise, or null while the estimate cannot be made. */
  body: ((name: string, referenceRiseK: number, teamId?: number) => Record<string, unknown>) | null;
};

const RISE_SPEC = { label: 'Reference rise', unit: 'K', read: 'temperatureDifference', above: 0, max: 300 } as const;

/** Saves the estimate as a catalogue heatsink (owners and designers), rated at a reference rise, then opens it. */
export function SaveEstimate({ defaultName, body }: SaveEstimateProps) {
  const router = useRouter();
  const { team, memberships } = useCurrentTeam();
  const save = useSaveHeatsink();
  const [name, setName] = useState('');
  const [riseText, setRiseText] = useState('50');
  const [error, setError] = useState<string | null>(null);
  if (!canEditCatalogue(memberships, team?.teamId)) {
    return (
      <Text variant="caption" tone="muted">
        Owners and designers of the team can save this estimate to the catalogue.
      </Text>
    );
  }
  const rise = readField(riseText, RISE_SPEC);
  const submit = async () => {
    setError(null);
    if (!body || !rise.ok) return;
    try {
      const item = await save.mutateAsync(body(name.trim() || defaultName, rise.value, team?.teamId));
      router.push(`/heatsinks/${item.id}`);
    } catch (e) {
      setError(errorMessage(e));
    }
  };
  return (
    <View style={styles.wrap}>
      <Text variant="heading">Save to catalogue</Text>
      <Text variant="caption" tone="muted">
        {`Adds the estimate to ${team?.teamName ?? 'the team'}’s heatsinks, rated in still air at the reference rise (with its forced-air points), so studies can pick it. Its notes say it is an estimate from geometry and list the assumptions.`}
      </Text>
      <View style={styles.row}>
        <View style={styles.name}>
          <TextField label="Name" value={name} onChangeText={setName} placeholder={defaultName} />
        </View>
        <View style={styles.rise}>
          <TextField
            label="Reference rise (K)"
            value={riseText}
            onChangeText={setRiseText}
            error={rise.ok ? undefined : rise.message}
            hint="Studies scale Rθsa from this rise by (ΔTref/ΔT)^¼."
            autoCapitalize="none"
            inputMode="decimal"
          />
        </View>
      </View>
      {error ? <InlineAlert message={error} /> : null}
      <Button label="Save to catalogue" onPress={submit} busy={save.isPending} disabled={!body || !rise.ok} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  name: { flexGrow: 2, flexBasis: 240 },
  rise: { flexGrow: 1, flexBasis: 150, maxWidth: 240 },
  button: { alignSelf: 'flex-start' },
});
