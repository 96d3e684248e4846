import { BackLink } from '@/components/layout/BackLink';
import { ButtonLink } from '@/components/ui/ButtonLink';
import { EmptyState } from '@/components/ui/EmptyState';

export default function JobNotFound() {
  return (
    <div className="flex flex-col gap-4">
      <BackLink href="/jobs">Jobs</BackLink>
      <EmptyState
        title="This job isn’t here"
        action={<ButtonLink href="/jobs">Back to jobs</ButtonLink>}
      >
        The link may be wrong, or the job was deleted.
      </EmptyState>
    </div>
  );
}
