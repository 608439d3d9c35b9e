import { ConfigService } from '@nestjs/config';
import { AppError } from '../common/errors/app-error';
import { EnvironmentVariables } from '../config/env.validation';
import { DevMailController } from './dev-mail.controller';

function controllerWith(env: Partial<EnvironmentVariables>): DevMailController {
  const config = { get: (key: keyof EnvironmentVariables) => env[key] } as unknown as ConfigService<EnvironmentVariables, true>;
  return new DevMailController(config);
}

describe('DevMailController', () => {
  it('answers 404 when DEV_MAIL_ENABLED is not true, even with the mail fake configured', async () => {
    const controller = controllerWith({ DEV_MAIL_ENABLED: false, MAIL_FAKE_URL: 'http://127.0.0.1:9/messages' });
    await expect(controller.list()).rejects.toBeInstanceOf(AppError);
    await expect(controller.list()).rejects.toMatchObject({ status: 404 });
  });

  it('answers 404 when enabled but no mail fake is configured', async () => {
    await expect(controllerWith({ DEV_MAIL_ENABLED: true }).list()).rejects.toMatchObject({ status: 404 });
  });
});
