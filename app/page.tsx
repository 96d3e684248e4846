import { redirect } from 'next/navigation';

// The jobs list is home; the signed-in shell sends strangers to /sign-in.
export default function Home() {
  redirect('/jobs');
}
