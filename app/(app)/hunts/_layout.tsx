import { Stack } from 'expo-router';

export default function HuntsLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
