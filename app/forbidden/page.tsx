import type { Metadata } from 'next';
import { StatusPage } from '@/components/layout/StatusPage';
import { ButtonLink } from '@/components/ui/ButtonLink';

export const metadata: Metadata = { title: 'Not allowed' };

// Where the app sends someone whose role may not open a page (the API answers 403 as well).
export default function ForbiddenPage() {
  return (
    <StatusPage
      code="403 · NOT ALLOWED"
      title="Your role can’t open this page"
      actions={
        <>
          <ButtonLink href="/jobs">Back to jobs</ButtonLink>
          <ButtonLink href="/settings" variant="secondary">
            See your role in Settings
          </ButtonLink>
        </>
      }
    >
      <p>
        This part of Joistwright is kept for other roles in your firm. If you need it for your work,
        ask the firm’s owner to change your role.
      </p>
    </StatusPage>
  );
}
