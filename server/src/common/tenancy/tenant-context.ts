import { Injectable } from '@nestjs/common';
import { ClsService } from 'nestjs-cls';

const COMPANY_KEY = 'companyId';

/**
 * The company the current request acts for, set once by authentication and read by the tenant
 * repository. Kept in continuation-local storage so no service has to pass it along by hand.
 */
@Injectable()
export class TenantContext {
  constructor(private readonly cls: ClsService) {}

  enter(companyId: string): void {
    this.cls.set(COMPANY_KEY, companyId);
  }

  /** The current company; a programming error (500) if a scoped query runs outside an authenticated request. */
  get companyId(): string {
    const companyId = this.cls.isActive()
      ? this.cls.get<string | undefined>(COMPANY_KEY)
      : undefined;
    if (!companyId)
      throw new Error('A company-scoped query ran without a company in the request context');
    return companyId;
  }

  /** Runs `work` as the given company, for code outside HTTP requests (seed, jobs, tests). */
  run<T>(companyId: string, work: () => Promise<T>): Promise<T> {
    return this.cls.run(async () => {
      this.enter(companyId);
      return work();
    });
  }
}
