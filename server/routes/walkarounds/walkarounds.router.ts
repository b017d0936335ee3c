import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  WALKAROUND_PHOTO_MAX_BYTES,
  checklistQuerySchema,
  checklistResponseSchema,
  walkaroundCreateSchema,
  walkaroundListQuerySchema,
  walkaroundListResponseSchema,
  walkaroundOutcomeSchema,
  walkaroundPhotoResponseSchema,
  walkaroundResponseSchema,
} from '../../../shared/schemas/walkarounds';
import { authorize } from '../../policies/access';
import { canDoWalkaround, canEditChecklists, canInspect } from '../../policies/walkaround';
import { loadMachine } from '../../services/machines';
import {
  assertMayStart,
  loadMachineToWalk,
  submitWalkaround,
  walkaroundStart,
} from '../../services/walkarounds';
import { listWalkarounds, loadWalkaround } from '../../services/walkaround-history';
import { storeWalkaroundPhoto, walkaroundPhotoFile } from '../../services/walkaround-photos';
import { taggedOutMessage } from '../../services/defects';
import { fileUpload } from '../../middlewares/upload';
import { presentChecklistItem, presentWalkaround } from '../../presenters/walkaround';
import { presentDefect, presentMachineRef, walkaroundPhotoUrls } from '../../presenters/defect';
import { presentRestriction } from '../../presenters/machine';
import { peopleById } from '../../presenters/people';
import { sendObject } from '../service-records/attachments.router';
import { registerChecklistTemplateRoutes } from './checklists.router';
import { registerLabelRoutes } from './label.router';

const orgParams = z.object({ orgId: z.uuid() });
const machineParams = orgParams.extend({ machineId: z.uuid() });

const CRITICAL_NOTE =
  'A fail on an item marked critical tags the machine out: it must not be used until a technician or manager clears it.';

const outcomeSchema = walkaroundOutcomeSchema;

/** Walkarounds: the checklist for a machine, submission (offline-safe), photos, history, labels. */
export function walkaroundsRouter(): Router {
  const router = Router();
  registerChecklistTemplateRoutes(router);
  registerLabelRoutes(router);

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/checklist',
    summary:
      "Start a walkaround: the machine's checklist (its category's template, else the built-in list). purpose=use is refused (409 tagged_out) on a tagged-out machine; an operator's request for a machine assigned to others answers 404 not_assigned",
    tags: ['walkarounds'],
    params: machineParams,
    query: checklistQuerySchema,
    response: checklistResponseSchema,
    handler: async ({ req, params, query }) => {
      const access = req.access!;
      const { machine } = await loadMachineToWalk(access, params.machineId);
      assertMayStart(access, machine, query.purpose);
      const { checklist, lastReading, dailyCare } = await walkaroundStart(access, machine);
      return {
        data: {
          machine: {
            ...presentMachineRef(machine),
            lastReading: lastReading && {
              value: lastReading.value,
              takenAt: lastReading.takenAt.toISOString(),
            },
            restriction: presentRestriction(machine, access.via),
          },
          purpose: query.purpose,
          template: checklist.template,
          items: checklist.items.map(presentChecklistItem),
          criticalNote: CRITICAL_NOTE,
          dailyCare,
        },
        abilities: { editTemplate: canEditChecklists(access), inspect: canInspect(access) },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/walkarounds',
    summary:
      'Submit a walkaround (201). A clientId already used answers 200 with the first one, so a re-sent offline form is not doubled. Fails and attentions raise defects; a critical fail tags the machine out',
    tags: ['walkarounds'],
    params: orgParams,
    body: walkaroundCreateSchema,
    status: 201,
    response: outcomeSchema,
    handler: async ({ req, res, body }) => {
      const access = req.access!;
      const outcome = await submitWalkaround(access, body);
      const { machine, defects } = outcome;
      const people = await peopleById([
        outcome.walkaround.operatorId,
        ...defects.flatMap((d) => [d.reportedBy, d.assignedTo, d.fixedBy]),
      ]);
      const taggedOut = machine.status === 'tagged_out';
      const result = {
        data: presentWalkaround(outcome.walkaround, machine, people),
        defects: defects.map((d) => presentDefect(d, machine, people)),
        machine: presentMachineRef(machine),
        taggedOut,
        message: taggedOut ? taggedOutMessage(machine) : null,
        duplicate: !outcome.created,
      };
      if (outcome.created) return result;
      res.status(200).json(result);
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/walkarounds',
    summary: 'Walkarounds, newest first (operators: of the machines they may see)',
    tags: ['walkarounds'],
    params: orgParams,
    query: walkaroundListQuerySchema,
    response: walkaroundListResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      if (query.machineId) await loadMachine(access, query.machineId);
      const { total, walkarounds, machineOf } = await listWalkarounds(access, query);
      const people = await peopleById(walkarounds.map((w) => w.operatorId));
      return {
        data: walkarounds.map((w) => presentWalkaround(w, machineOf.get(w.machineId)!, people)),
        meta: { total, page: query.page, pageSize: query.pageSize },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/walkarounds/:walkaroundId',
    summary: 'One walkaround with the defects it raised',
    tags: ['walkarounds'],
    params: orgParams.extend({ walkaroundId: z.uuid() }),
    response: walkaroundResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { walkaround: w, machine, defects } = await loadWalkaround(access, params.walkaroundId);
      const people = await peopleById([
        w.operatorId,
        ...defects.flatMap((d) => [d.reportedBy, d.assignedTo, d.fixedBy]),
      ]);
      return {
        data: presentWalkaround(w, machine, people),
        defects: defects.map((d) => presentDefect(d, machine, people)),
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/walkaround-photos',
    summary:
      'Upload a photo for a walkaround item before submitting (JPEG, PNG, WebP or HEIC, at most 10 MB, checked by content); answer with its id',
    tags: ['walkarounds'],
    params: machineParams,
    before: [fileUpload('photo', WALKAROUND_PHOTO_MAX_BYTES, 'a photo')],
    multipartBody: z.object({ photo: z.string().openapi({ format: 'binary' }) }),
    status: 201,
    response: walkaroundPhotoResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canDoWalkaround(access, machine), 'Your role does not do walkarounds');
      const photo = await storeWalkaroundPhoto(access, machine, req.file!.buffer);
      const urls = walkaroundPhotoUrls(access.organization.id, photo.id);
      return { data: { id: photo.id, photoUrl: urls.photoUrl!, thumbnailUrl: urls.thumbnailUrl! } };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/walkaround-photos/:photoId',
    summary: 'A walkaround photo (size=thumb for the thumbnail), to people who may see the machine',
    tags: ['walkarounds'],
    params: orgParams.extend({ photoId: z.uuid() }),
    query: z.object({ size: z.enum(['full', 'thumb']).default('full') }),
    response: z.string().openapi({ format: 'binary' }),
    handler: async ({ req, res, params, query }) => {
      const access = req.access!;
      await sendObject(
        res,
        await walkaroundPhotoFile(access, params.photoId, query.size === 'thumb'),
      );
    },
  });

  return router;
}
