import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, InlineAlert, LoadingState, Text, TextField } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

export type LibraryPickerProps<T extends { id: number; name: string; isDemo: boolean }> = {
  title: string;
  query: { data?: T[]; isPending: boolean; isError: boolean; error: unknown };
  /** One line of facts under the entry's name. */
  describe: (item: T) => string;
  /** The action under a chosen entry (a button, or a choice and a button). */
  renderChoice: (item: T) => ReactNode;
  empty: string;
  onClose: () => void;
};

/** A searchable list of the team's catalogue entries; choosing one shows how to copy it in. */
export function LibraryPicker<T extends { id: number; name: string; isDemo: boolean }>({ title, query, describe, renderChoice, empty, onClose }: LibraryPickerProps<T>) {
  const [search, setSearch] = useState('');
  const [chosen, setChosen] = useState<number | null>(null);
  const words = search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const items = (query.data ?? []).filter((item) => words.every((w) => `${item.name} ${describe(item)}`.toLowerCase().includes(w)));

  return (
    <View style={styles.box} role="region" aria-label={title}>
      <View style={styles.head}>
        <Text variant="bodyStrong">{title}</Text>
        <Button label="Close" variant="ghost" onPress={onClose} />
      </View>
      {query.isPending ? <LoadingState label="Loading…" /> : null}
      {query.isError ? <InlineAlert message={errorMessage(query.error)} /> : null}
      {query.data ? (
        <>
          <TextField label="Search" value={search} onChangeText={setSearch} autoCapitalize="none" />
          {items.length === 0 ? <Text tone="muted">{query.data.length === 0 ? empty : 'Nothing matches the search.'}</Text> : null}
          {items.slice(0, 30).map((item) => (
            <View key={item.id} style={[styles.item, chosen === item.id && styles.chosen]}>
              <Pressable role="button" accessibilityLabel={`Choose ${item.name}`} onPress={() => setChosen(item.id)} style={styles.pick}>
                <Text variant="bodyStrong">
                  {item.name}
                  {item.isDemo ? <Text variant="caption" tone="faint">{'  demo data'}</Text> : null}
                </Text>
                <Text variant="caption" tone="muted">
                  {describe(item)}
                </Text>
              </Pressable>
              {chosen === item.id ? renderChoice(item) : null}
            </View>
          ))}
          {items.length > 30 ? <Text variant="caption" tone="faint">{items.length - 30} more: narrow the search.</Text> : null}
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.accent, backgroundColor: color.accentSoft },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  item: { gap: spacing.sm, padding: spacing.sm, borderRadius: radius.md, backgroundColor: color.surface, borderWidth: 1, borderColor: color.border },
  chosen: { borderColor: color.accent },
  pick: { gap: spacing.xxs },
});
