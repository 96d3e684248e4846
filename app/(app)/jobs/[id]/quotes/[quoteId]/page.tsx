import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { requireUser } from '@/components/layout/currentUser';
import { QuoteEditor } from '@/components/quotes/QuoteEditor';
import { idSchema } from '@/lib/validation/common';
import { canDo } from '@/lib/validation/businessAccess';

export const metadata: Metadata = { title: 'Quote' };

export default async function QuotePage({
  params,
}: {
  params: Promise<{ id: string; quoteId: string }>;
}) {
  const { id, quoteId } = await params;
  if (!idSchema.safeParse(id).success || !idSchema.safeParse(quoteId).success) notFound();
  const user = await requireUser();
  if (!canDo(user, 'quote:read')) notFound();
  return <QuoteEditor jobId={id} quoteId={quoteId} />;
}
