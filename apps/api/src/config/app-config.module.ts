import { Global, Module, type DynamicModule } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { parseAppConfig } from './app-config.schema.js';
import { AppConfigService } from './app-config.service.js';

@Global()
@Module({})
export class AppConfigModule {
  /**
   * `overrides` win over process.env; tests use them to run apps with different limits. The parsed
   * config is loaded (not `validate`d) so Nest does not write defaults back into process.env.
   */
  static forRoot(overrides: Record<string, string> = {}): DynamicModule {
    return {
      module: AppConfigModule,
      imports: [
        ConfigModule.forRoot({
          ignoreEnvFile: true,
          validatePredefined: false,
          skipProcessEnv: true,
          load: [() => parseAppConfig({ ...process.env, ...overrides })],
        }),
      ],
      providers: [AppConfigService],
      exports: [AppConfigService],
    };
  }
}
