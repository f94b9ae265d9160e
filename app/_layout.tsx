import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { StyleSheet, useColorScheme, View } from 'react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { SWRConfig } from 'swr';
import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { SourceSans3_700Bold } from '@expo-google-fonts/source-sans-3/700Bold';

import { ThemeProvider } from '@/components/theme/theme-provider';
import { fonts, palettes } from '@/components/theme/tokens';
import { swrOptions } from '@/lib/api/swr-options';

const swrValue = { ...swrOptions, provider: () => new Map() };

/** Root of the app: fonts, theme, safe areas and data fetching wrap every route. */
export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts({
    [fonts.regular]: SourceSans3_400Regular,
    [fonts.semibold]: SourceSans3_600SemiBold,
    [fonts.bold]: SourceSans3_700Bold,
  });
  const scheme = useColorScheme() === 'dark' ? 'dark' : 'light';

  if (!fontsLoaded && !fontError) {
    return <View style={[styles.fill, { backgroundColor: palettes[scheme].background }]} />;
  }

  return (
    <SafeAreaProvider>
      <ThemeProvider systemFont={!fontsLoaded}>
        <SWRConfig value={swrValue}>
          <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
          <Slot />
        </SWRConfig>
      </ThemeProvider>
    </SafeAreaProvider>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
});
