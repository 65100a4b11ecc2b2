import { StyleSheet, View } from 'react-native';

import { Card, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { conditionFacts, deviceFacts, profileFacts, sinkFacts } from '../document-facts';
import { readStudyDocument } from '../study-document';
import { FactGrid } from './fact-grid';
import { InputItem, InputSection } from './input-section';

export type StudyInputsProps = { document: unknown };

/** Read-only summary of the study's design inputs, as the solver would read them. */
export function StudyInputs({ document }: StudyInputsProps) {
  const state = readStudyDocument(document);
  return (
    <Card style={styles.card}>
      <View style={styles.head}>
        <Text variant="heading">Design inputs</Text>
        {state.kind === 'ok' ? (
          <Text variant="mono" tone="faint">
            {state.document.format} v{state.document.version}
          </Text>
        ) : null}
      </View>
      {state.kind === 'empty' ? <Text tone="muted">No design inputs have been saved in this study yet.</Text> : null}
      {state.kind === 'invalid' ? (
        <View role="alert" style={styles.invalid}>
          <Text tone="danger">The saved document could not be read.</Text>
          <Text variant="mono" tone="muted">
            {state.message}
          </Text>
        </View>
      ) : null}
      {state.kind === 'ok' ? (
        <>
          <InputSection title="Conditions">
            <FactGrid facts={conditionFacts(state.document)} />
          </InputSection>
          <InputSection title={state.document.devices.length === 1 ? 'Pass element' : 'Pass elements'}>
            {state.document.devices.map((device) => (
              <InputItem key={device.id} name={device.name ?? device.id} id={device.id} facts={deviceFacts(device)} />
            ))}
          </InputSection>
          <InputSection title={state.document.sinks.length === 1 ? 'Heatsink' : 'Heatsinks'}>
            {state.document.sinks.map((sink) => (
              <InputItem key={sink.id} name={sink.name ?? sink.id} id={sink.id} facts={sinkFacts(sink)} />
            ))}
          </InputSection>
          <InputSection title="Load profile">
            <FactGrid facts={profileFacts(state.document.profile)} />
          </InputSection>
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.md },
  invalid: { gap: spacing.xs },
});
