/** Native cameras report a torch through expo-camera itself; offer the switch there. */
export function useTorchSupport(): boolean {
  return true;
}
