import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Stack, type ErrorBoundaryProps } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { View } from 'react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { AppText } from '../components/AppText';
import { Button } from '../components/Button';
import { createQueryClient } from '../hooks/queryClient';
import { fonts, space, ThemeProvider, useTheme } from '../theme';

/** Shown by Expo Router when any screen below throws while rendering. */
export function ErrorBoundary({ error, retry }: ErrorBoundaryProps) {
  return (
    <ThemeProvider>
      <View style={{ flex: 1, padding: space.xl, gap: space.md, justifyContent: 'center' }} role="alert">
        <AppText variant="title">This screen hit a problem</AppText>
        <AppText tone="muted">{error.message}</AppText>
        <Button label="Try again" onPress={() => void retry()} />
      </View>
    </ThemeProvider>
  );
}

function ThemedStack() {
  const { colors, scheme } = useTheme();
  return (
    <>
      <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
      <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.background } }} />
    </>
  );
}

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  // Fonts ship in assets/fonts; nothing is fetched from elsewhere at run time.
  const [fontsLoaded, fontError] = useFonts({
    [fonts.regular]: require('../assets/fonts/AtkinsonHyperlegible_400Regular.ttf'),
    [fonts.bold]: require('../assets/fonts/AtkinsonHyperlegible_700Bold.ttf'),
  });
  if (!fontsLoaded && !fontError) return null;
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <ThemeProvider>
          <ThemedStack />
        </ThemeProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
