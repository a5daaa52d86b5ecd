import { Global, Inject, Module } from '@nestjs/common';
import { loadConfig } from './app-config';

/** Injection token of the validated `AppConfig`. */
export const APP_CONFIG = Symbol('APP_CONFIG');

/** Injects the validated configuration: `constructor(@InjectConfig() config: AppConfig)`. */
export const InjectConfig = (): ParameterDecorator => Inject(APP_CONFIG);

/** Reads the configuration once, when the application is created, and shares it with every module. */
@Global()
@Module({
  providers: [{ provide: APP_CONFIG, useFactory: () => loadConfig(process.env) }],
  exports: [APP_CONFIG],
})
export class AppConfigModule {}
