import type { Metadata } from 'next';
import { CatalogueBrowser } from '@/components/catalogue/CatalogueBrowser';
import { PageHeader } from '@/components/layout/PageHeader';
import { requireUser } from '@/components/layout/currentUser';
import { can } from '@/lib/validation/access';

export const metadata: Metadata = { title: 'Catalogue' };

// The firm's products and prices. Everyone may look; only the owner changes them.
export default async function CataloguePage() {
  const user = await requireUser();
  const canEdit = can(user, 'catalogue:write');
  return (
    <>
      <PageHeader
        title="Catalogue"
        description={
          canEdit
            ? 'The products you buy: sizes, stock lengths, prices, and the limits the frame checks read.'
            : 'The firm’s products and the limits the frame checks read. Only the owner changes them.'
        }
      />
      <CatalogueBrowser units={user.units} canEdit={canEdit} />
    </>
  );
}
