// The job page's business sections: quotes (owners and designers), site photos and build stages.
import { BuildStages } from '@/components/stages/BuildStages';
import { JobFiles } from '@/components/files/JobFiles';
import { canDo } from '@/lib/validation/businessAccess';
import type { Role } from '@/models/constants';
import { JobPaperwork } from './JobPaperwork';
import { JobQuotes } from './JobQuotes';

export function JobBusinessSections({ jobId, role }: { jobId: string; role: Role }) {
  return (
    <div className="mt-6 flex flex-col gap-6">
      {canDo({ role }, 'quote:read') ? <JobQuotes jobId={jobId} /> : null}
      {canDo({ role }, 'mail:send') ? <JobPaperwork jobId={jobId} /> : null}
      <BuildStages jobId={jobId} />
      <JobFiles jobId={jobId} />
    </div>
  );
}
