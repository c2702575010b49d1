import { Router } from 'express';
import { idParamsSchema, waiverAcceptSchema, waiverPublishSchema } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { singleUpload, uploadedFile } from '../../lib/uploads';
import { parse } from '../../lib/validate';
import { currentUser, requirePermission, requireUser } from '../../middleware/auth';
import { memberIdParam, selfOr } from '../../middleware/member-access';
import { SCAN_UPLOAD, waiversService } from './waivers.service';

const extensions: Record<string, string> = { 'application/pdf': 'pdf', 'image/jpeg': 'jpg', 'image/png': 'png' };

export function waiversRoutes(deps: Deps): Router {
  const service = waiversService(deps);
  const router = Router();
  const memberId = (params: unknown) => parse(idParamsSchema, params, 'params').id;

  router.get('/waivers/current', requireUser, async (_req, res) => {
    res.json(await service.current());
  });

  router.post('/waivers/accept', requirePermission('accept:waiver:own'), async (req, res) => {
    const input = parse(waiverAcceptSchema, req.body, 'body');
    const { status, created } = await service.accept(currentUser(req), input);
    res.status(created ? 201 : 200).json(status);
  });

  router.post('/waivers', requirePermission('manage:waiver:any'), async (req, res) => {
    const input = parse(waiverPublishSchema, req.body, 'body');
    res.status(201).json(await service.publish(currentUser(req), input));
  });

  router.get('/members/:id/waiver', requireUser, selfOr(null, 'manage:waiver:any'), async (req, res) => {
    res.json(await service.status(memberId(req.params)));
  });

  router.post('/members/:id/waiver-scan', requirePermission('manage:waiver:any'), memberIdParam, singleUpload(SCAN_UPLOAD), async (req, res) => {
    const status = await service.uploadScan(currentUser(req), memberId(req.params), uploadedFile(req, SCAN_UPLOAD));
    res.status(201).json(status);
  });

  router.get('/members/:id/waiver-scan', requirePermission('manage:waiver:any'), memberIdParam, async (req, res) => {
    const scan = await service.scan(memberId(req.params));
    // Sent as a download, never shown inline from this origin: it is a file someone uploaded.
    res.setHeader('Cache-Control', 'no-store');
    res.type(scan.scanType).attachment(`waiver-v${scan.version}-scan.${extensions[scan.scanType] ?? 'bin'}`);
    res.send(scan.scan);
  });

  return router;
}
