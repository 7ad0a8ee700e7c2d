import { Stack } from 'expo-router';

export default function AuthLayoutRoute() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
