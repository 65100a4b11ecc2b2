import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';

import { Text } from '@/components/ui';
import { color } from '@/constants/theme';

import { splitLinks } from '../app-links';

export type MessageTextProps = { text: string };

/** A message body with its links live: links into this app open here, others in a new tab. */
export function MessageText({ text }: MessageTextProps) {
  return (
    <Text style={styles.body}>
      {/* Mail text pads its sign-off with blank lines; one is enough on screen. */}
      {splitLinks(text.replace(/\n{3,}/g, '\n\n')).map((part, index) =>
        part.kind === 'text' ? (
          part.text
        ) : part.path ? (
          <Link key={index} href={part.path} style={styles.link}>
            {part.href}
          </Link>
        ) : (
          <Link key={index} href={part.href} target="_blank" rel="noopener" style={styles.link}>
            {part.href}
          </Link>
        ),
      )}
    </Text>
  );
}

const styles = StyleSheet.create({
  body: { flexShrink: 1 },
  link: { textDecorationLine: 'underline', color: color.accent },
});
