import { QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import Head from 'expo-router/head';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { createQueryClient } from '@/lib/api/query-client';
import { useAppFonts } from '@/lib/fonts';

/** Root providers: the house typeface (shipped with the app), the query cache and safe areas. */
export default function RootLayout() {
  const fontsReady = useAppFonts();
  const [queryClient] = useState(createQueryClient);
  if (!fontsReady) return null;
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
