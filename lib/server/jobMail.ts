// E-mails a design's paperwork through the outbox: the framing plan PDF and the cut list (CSV) to
// the crew, the materials order (CSV) to a supplier. Each message is recorded and retried.
import { materialsCsv } from '@/engine/takeoff/csv';
import type { CutList } from '@/engine/types';
import { framingPlanPdf } from '@/lib/pdf/framingPlan';
import { DEFAULT_WASTE_PCT } from '@/lib/pdf/requests';
import type { SessionUser } from '@/lib/validation/access';
import { jobMailSchema } from '@/lib/validation/jobMail';
import { assertCanDo } from './businessAccess';
import { bdb } from './businessDb';
import { BadRequest, parseInput } from './errors';
import { fileSlug, loadDesignForCrew, pricedMaterials } from './framing';
import { queueMail } from './mail';

/** The cut list as CSV: one row per stock piece, its cuts and offcut, joists then boards. */
export function cutListCsv(cutList: CutList): string {
  const rows = [['member', 'stock mm', 'cuts mm', 'offcut mm']];
  const add = (label: string, r: CutList['joists'] | undefined) => {
    for (const s of r?.stock ?? [])
      rows.push([
        label,
        String(s.stockMm),
        s.cuts.map((c) => Math.round(c)).join(' + '),
        String(Math.round(s.offcutMm)),
      ]);
  };
  add('joist', cutList.joists);
  add('board', cutList.boards);
  add('border board', cutList.borderBoards);
  return (
    rows
      .map((r) => r.map((c) => (/[",\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(','))
      .join('\n') + '\n'
  );
}

export async function sendJobPaperwork(
  actor: SessionUser,
  jobId: string,
  input: unknown,
): Promise<{ sent: { to: string; status: string }[] }> {
  assertCanDo(actor, 'mail:send');
  const body = parseInput(jobMailSchema, input);
  const loaded = await loadDesignForCrew(actor, body.designId);
  const { models } = bdb();
  const design = await models.Design.findOne({
    where: { id: body.designId, firmId: actor.firmId },
  });
  if (!design || design.jobId !== jobId) throw new BadRequest('That design is not on this job');
  const firm = await models.Firm.findByPk(actor.firmId);
  const slug = `${fileSlug(loaded.jobTitle)}-v${loaded.version}`;
  const out: { to: string; status: string }[] = [];

  if (body.kind === 'plan') {
    let to = body.to ?? [];
    if (to.length === 0)
      to = (
        await models.User.findAll({ where: { firmId: actor.firmId, role: 'crew', active: true } })
      ).map((u) => u.email);
    if (to.length === 0) throw new BadRequest('The firm has no crew to send the plan to');
    const pdf = framingPlanPdf({
      plan: loaded.plan,
      design: loaded.design,
      meta: loaded.meta,
      paper: 'a4',
    });
    for (const addr of to) {
      const m = await queueMail({
        firmId: actor.firmId,
        kind: 'plan',
        to: addr,
        replyTo: actor.email,
        subject: `Framing plan and cut list: ${loaded.jobTitle} (v${loaded.version})`,
        text: [
          body.message ?? `The framing plan and cut list for ${loaded.jobTitle} are attached.`,
          '',
          'Check for buried services before digging. The checks are guidance; local building codes and a qualified engineer decide.',
          '',
          actor.name,
        ].join('\n'),
        attachments: [
          {
            filename: `framing-plan-${slug}.pdf`,
            contentType: 'application/pdf',
            content: Buffer.from(pdf),
          },
          {
            filename: `cut-list-${slug}.csv`,
            contentType: 'text/csv',
            content: cutListCsv(loaded.plan.cutList),
          },
        ],
        jobId,
        createdById: actor.id,
      });
      out.push({ to: addr, status: m.status });
    }
    return { sent: out };
  }

  const priced = await pricedMaterials(actor, loaded, body.wastePct ?? DEFAULT_WASTE_PCT);
  for (const addr of body.to) {
    const m = await queueMail({
      firmId: actor.firmId,
      kind: 'order',
      to: addr,
      replyTo: firm?.email ?? actor.email,
      subject: `Materials order from ${firm?.name ?? 'us'}: ${loaded.jobTitle}`,
      text: [
        body.message ??
          'Please supply the materials in the attached list and confirm price and delivery date.',
        '',
        `${firm?.name ?? ''}`,
        [firm?.address, firm?.town, firm?.postcode].filter(Boolean).join(', '),
      ].join('\n'),
      attachments: [
        {
          filename: `materials-${slug}.csv`,
          contentType: 'text/csv',
          content: materialsCsv(priced),
        },
      ],
      jobId,
      createdById: actor.id,
    });
    out.push({ to: addr, status: m.status });
  }
  return { sent: out };
}
