import { Redirect } from 'expo-router';
import { Tabs } from 'expo-router/js-tabs';
import { AppTabBar } from '@/components/navigation/app-tab-bar';
import { useSession } from '@/lib/session/session-provider';
import { useTheme } from '@/theme/theme-provider';
import { useLayout } from '@/theme/use-layout';

export default function SignedInLayout() {
  const { ready, user } = useSession();
  const theme = useTheme();
  const { isWide } = useLayout();
  if (!ready) return null;
  if (!user) return <Redirect href="/sign-in" />;
  return (
    <Tabs
      tabBar={(props) => <AppTabBar {...props} />}
      screenOptions={{
        headerShown: false,
        tabBarPosition: isWide ? 'left' : 'bottom',
        sceneStyle: { backgroundColor: theme.surface },
      }}
    >
      <Tabs.Screen name="sift" options={{ title: 'Sift' }} />
      <Tabs.Screen name="hunts" options={{ title: 'Hunts' }} />
      <Tabs.Screen name="keepers" options={{ title: 'Keepers' }} />
      <Tabs.Screen name="odds" options={{ title: 'Odds' }} />
      <Tabs.Screen name="you" options={{ title: 'You' }} />
      <Tabs.Screen name="sweep" options={{ title: 'Sweep', href: null }} />
      <Tabs.Screen name="tally" options={{ title: 'Tally', href: null }} />
      <Tabs.Screen name="console" options={{ title: 'Console', href: null }} />
    </Tabs>
  );
}
