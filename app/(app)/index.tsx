import { Redirect } from 'expo-router';

/** The workshop's home is its vehicles. */
export default function Home() {
  return <Redirect href="/vehicles" />;
}
