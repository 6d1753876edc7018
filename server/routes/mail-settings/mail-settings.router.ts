import { Router } from 'express';
import { updateMailSettingsSchema } from '@shared/schemas/mail-settings';
import { idParams } from '@shared/schemas/studio';
import { route } from '../../lib/route';
import { authorize } from '../../policies';
import { loadStudio } from '../../services/access';
import { mailSettings, updateMailSettings } from '../../services/mail-settings';

/** Each person's own choice of e-mails per studio: any member, for themselves only. */
export function mailSettingsRouter() {
  const r = Router();

  r.get(
    '/studios/:id/mail-settings',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'read');
      res.json(await mailSettings(user, studio));
    }),
  );

  r.put(
    '/studios/:id/mail-settings',
    route({ params: idParams, body: updateMailSettingsSchema }, async ({ params, body, user, res }) => {
      const { studio, abilities } = await loadStudio(user, params.id);
      authorize(abilities, 'read');
      res.json(await updateMailSettings(user, studio, body));
    }),
  );

  return r;
}
