import type { View } from 'react-native';

/** Native screens keep their place; the web version brings a step's start into view. */
export function scrollToStart(_node: View | null) {}
