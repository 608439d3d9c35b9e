import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from './env.validation';

/** ConfigService typed over the validated environment: `config.get('JWT_SECRET', { infer: true })`. */
export type AppConfigService = ConfigService<EnvironmentVariables, true>;
