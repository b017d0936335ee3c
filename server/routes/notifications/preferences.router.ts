import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { canChooseDigest, canManageFarmFeed, canSetDigestHour } from '../../policies/reminders';
import { presentPreference } from '../../presenters/notification';
import { digestMachineChoices } from '../../services/digest-choices';
import { digestHourOf, setDigestHour } from '../../services/reminders';
import { ownPreference, saveOwnPreference } from '../../services/digest-preferences';
import {
  notificationPreferenceSchema,
  preferenceResponseSchema,
  reminderPreferencesResponseSchema,
  reminderSettingsResponseSchema,
  reminderSettingsSchema,
} from '../../../shared/schemas/notifications';

const orgParams = z.object({ orgId: z.uuid() });
const FARM_ONLY = 'Reminders are for the people of a farm';

/** Each person's own digest choices; a manager also sets the farm's digest hour. */
export function preferencesRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/notification-preferences',
    summary:
      "The caller's due-digest choices, the farm's digest hour and the machines to pick from",
    tags: ['notifications'],
    params: orgParams,
    response: reminderPreferencesResponseSchema,
    handler: async ({ req }) => {
      const access = req.access!;
      authorize(canChooseDigest(access), FARM_ONLY);
      const [preference, digestHour, machines] = await Promise.all([
        ownPreference(access),
        digestHourOf(access.organization.id),
        digestMachineChoices(access),
      ]);
      return {
        data: presentPreference(preference),
        meta: { digestHour, timeZone: access.organization.timeZone, machines },
        abilities: {
          setDigestHour: canSetDigestHour(access),
          manageFarmFeed: canManageFarmFeed(access),
        },
      };
    },
  });

  route(router, {
    method: 'put',
    path: '/organizations/:orgId/notification-preferences',
    summary: "Saves the caller's due-digest choices (daily, weekly on a weekday, or off; filters)",
    tags: ['notifications'],
    params: orgParams,
    body: notificationPreferenceSchema,
    response: preferenceResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canChooseDigest(access), FARM_ONLY);
      return { data: presentPreference(await saveOwnPreference(access, body)) };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/reminder-settings',
    summary: "Sets the local hour (farm's time zone) at which the digests and nudges go out",
    tags: ['notifications'],
    params: orgParams,
    body: reminderSettingsSchema,
    response: reminderSettingsResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(canSetDigestHour(access), 'Only a manager may change the digest hour');
      await setDigestHour(access.organization.id, body.digestHour, access.userId);
      return { data: { digestHour: body.digestHour, timeZone: access.organization.timeZone } };
    },
  });

  return router;
}
