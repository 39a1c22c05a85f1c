import { redirect } from 'next/navigation';
import { currentActor } from '@/lib/auth/current';

export default async function Home() {
  redirect((await currentActor()) ? '/projects' : '/sign-in');
}
