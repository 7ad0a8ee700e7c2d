import { Stack } from 'expo-router';

export default function ClubLayoutRoute() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
