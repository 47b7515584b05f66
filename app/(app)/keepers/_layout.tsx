import { Stack } from 'expo-router';

export default function KeepersLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
