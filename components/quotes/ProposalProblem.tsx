// What a client sees when their proposal link is damaged, altered or out of date.
import { StatusPage } from '@/components/layout/StatusPage';

export function ProposalProblem({ state }: { state: 'invalid' | 'expired' }) {
  return state === 'expired' ? (
    <StatusPage code="Link expired" title="This proposal has expired" actions={null}>
      <p>
        The link, or the quote behind it, is past its date. Please ask the firm that sent it for an
        up-to-date quote and a new link.
      </p>
    </StatusPage>
  ) : (
    <StatusPage code="Link not valid" title="We can’t open this proposal" actions={null}>
      <p>
        The link is incomplete or has been changed. Open it again from the e-mail you received, or
        ask the firm that sent it for a new one.
      </p>
    </StatusPage>
  );
}
