import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { DesignEditorLoader } from '@/components/editor/DesignEditorLoader';
import { canEditJobs } from '@/components/layout/roles';
import { getCurrentUser } from '@/lib/auth';
import { getDesign } from '@/lib/server/designs';
import { NotFound } from '@/lib/server/errors';
import { idSchema } from '@/lib/validation/common';

export const metadata: Metadata = { title: 'Design' };
export const dynamic = 'force-dynamic';

// The plan editor: the design is read on the server (firm-scoped), the editor itself runs only in the browser.
export default async function DesignPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  if (!idSchema.safeParse(id).success) notFound();
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in');
  let design;
  try {
    design = await getDesign(user, id);
  } catch (e) {
    if (e instanceof NotFound) notFound();
    throw e;
  }
  return (
    <DesignEditorLoader
      design={{
        id: design.id,
        jobId: design.jobId,
        name: design.name,
        version: design.version,
        document: design.document,
      }}
      readOnly={!canEditJobs(user.role)}
      units={user.units}
    />
  );
}
