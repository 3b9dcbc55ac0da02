import { router, type Href } from 'expo-router';

/** Back where the user came from; a deep link or reload has no history, so go to `fallback`. */
export function goBack(fallback: Href) {
  if (router.canGoBack()) router.back();
  else router.replace(fallback);
}
