import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { SignInForm } from '@/components/auth/SignInForm';
import { showDemoAccounts } from '@/components/auth/demoAccounts';
import { safeCallback } from '@/components/auth/safeCallback';
import { currentUser } from '@/components/layout/currentUser';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const params = await searchParams;
  const callbackUrl = safeCallback(params.callbackUrl);
  if (await currentUser()) redirect(callbackUrl);
  const error = typeof params.error === 'string' ? params.error : undefined;
  return (
    <SignInForm callbackUrl={callbackUrl} initialError={error} showDemo={showDemoAccounts()} />
  );
}
