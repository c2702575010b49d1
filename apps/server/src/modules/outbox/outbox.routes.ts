import { Router } from 'express';
import { outboxAttachmentParamsSchema } from '@chuckkey/core';
import { z } from 'zod';
import type { Deps } from '../../lib/deps';
import { notFound } from '../../lib/errors';
import { parse } from '../../lib/validate';
import { requirePermission } from '../../middleware/auth';
import { outboxRepository } from './outbox.repository';

const outboxQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});

export function outboxRoutes({ db }: Deps): Router {
  const outbox = outboxRepository(db);
  const router = Router();

  router.get('/', requirePermission('read:outbox:any'), async (req, res) => {
    const { page, pageSize } = parse(outboxQuerySchema, req.query, 'query');
    res.json(await outbox.list(page, pageSize));
  });

  router.get('/:id/attachments/:index', requirePermission('read:outbox:any'), async (req, res) => {
    const { id, index } = parse(outboxAttachmentParamsSchema, req.params, 'params');
    const attachment = await outbox.attachment(id, index);
    if (!attachment) throw notFound('attachment_not_found', 'That message has no such attachment.');
    // attachment() guesses a type from the file name; the caught type, with its parameters, wins.
    res.attachment(attachment.filename ?? `attachment-${index + 1}`);
    res.type(attachment.contentType);
    res.send(Buffer.from(attachment.content, 'utf8'));
  });

  return router;
}
