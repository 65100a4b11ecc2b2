import { Link, type Href } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, type PressableProps, type StyleProp, type ViewStyle } from 'react-native';

export type PressableLinkProps = Omit<PressableProps, 'style' | 'children'> & {
  href: Href;
  style?: StyleProp<ViewStyle>;
  /** Added while the link is pressed or hovered. */
  activeStyle?: StyleProp<ViewStyle>;
  children: ReactNode;
};

/**
 * A block-level link (a real anchor on the web). `Link asChild` merges the child's
 * props through a slot that only accepts a flat style object, so pressed and hover
 * feedback is tracked here instead of through Pressable's style callback.
 */
export function PressableLink({ href, style, activeStyle, children, ...rest }: PressableLinkProps) {
  const [pressed, setPressed] = useState(false);
  const [hovered, setHovered] = useState(false);
  const flat = StyleSheet.flatten([style, (pressed || hovered) && activeStyle]);
  return (
    <Link href={href} asChild>
      <Pressable
        role="link"
        {...rest}
        onPressIn={() => setPressed(true)}
        onPressOut={() => setPressed(false)}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        style={flat}
      >
        {children}
      </Pressable>
    </Link>
  );
}
