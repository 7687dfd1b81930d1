import type { View } from 'react-native';

/** On the web a View is its DOM element: bring a new step's start into view after a long previous step. */
export function scrollToStart(node: View | null) {
  (node as unknown as HTMLElement | null)?.scrollIntoView?.({ block: 'start' });
}
