import type { Metadata } from 'next';
import { StatusPage } from '@/components/layout/StatusPage';
import { ButtonLink } from '@/components/ui/ButtonLink';

export const metadata: Metadata = { title: 'Not found' };

export default function NotFound() {
  return (
    <StatusPage
      code="404 · NOT FOUND"
      title="There’s nothing here"
      actions={<ButtonLink href="/jobs">Go to jobs</ButtonLink>}
    >
      <p>
        The page may have moved, or the job or design was deleted. Check the address, or start again
        from the jobs list.
      </p>
    </StatusPage>
  );
}
