import { Global, Module } from '@nestjs/common';
import { ClsModule } from 'nestjs-cls';
import { TenantContext } from './tenant-context';
import { TenantRepositories } from './tenant-repository';

@Global()
@Module({
  imports: [ClsModule.forRoot({ global: true, middleware: { mount: true } })],
  providers: [TenantContext, TenantRepositories],
  exports: [TenantContext, TenantRepositories],
})
export class TenancyModule {}
