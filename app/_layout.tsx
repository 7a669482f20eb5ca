import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { SourceSans3_700Bold } from '@expo-google-fonts/source-sans-3/700Bold';
import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import Head from 'expo-router/head';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { createQueryClient } from '@/lib/api/query-client';
import { fonts } from '@/lib/theme';

/** Root providers: the house typeface (shipped with the app), the query cache and safe areas. */
export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts({
    [fonts.regular]: SourceSans3_400Regular,
    [fonts.semibold]: SourceSans3_600SemiBold,
    [fonts.bold]: SourceSans3_700Bold,
  });
  const [queryClient] = useState(createQueryClient);
  // A missing font is no reason to keep people out: fall back to the system face.
  if (!fontsLoaded && !fontError) return null;
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <Head>
          <title>Fizzwright</title>
        </Head>
        <Slot />
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
