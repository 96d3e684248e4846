// The client's proposal: public, reached only through a signed, expiring link. Shows this quote,
// its plan outline and the cautions; the client accepts (typing their name) or declines, then
// pays the deposit. Nothing else of the firm is reachable from here.
import type { Metadata } from 'next';
import { ProposalActions } from '@/components/quotes/ProposalActions';
import { ProposalView } from '@/components/quotes/ProposalView';
import { ProposalProblem } from '@/components/quotes/ProposalProblem';
import { confirmDepositReturn, loadProposal } from '@/lib/server/proposals';

export const metadata: Metadata = {
  title: 'Your deck proposal',
  robots: { index: false, follow: false },
  referrer: 'no-referrer',
};
export const dynamic = 'force-dynamic';

export default async function ProposalPage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ paid?: string; cancelled?: string }>;
}) {
  const { token } = await params;
  const { paid, cancelled } = await searchParams;
  // Back from the payment page: confirm with the payment service (safe to repeat).
  const justPaid = typeof paid === 'string' ? await confirmDepositReturn(token, paid) : false;
  const found = await loadProposal(token);
  if (found.state !== 'ok') return <ProposalProblem state={found.state} />;
  return (
    <main className="mx-auto flex w-full max-w-3xl flex-col gap-6 px-4 py-8 sm:py-12">
      <ProposalView view={found.view} />
      <ProposalActions
        token={token}
        view={found.view}
        justPaid={justPaid}
        cancelled={cancelled === '1'}
      />
    </main>
  );
}
