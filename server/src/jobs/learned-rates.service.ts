import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { adoptLearnedRateRequestSchema, learnedRates, type LearnedRate } from '@pondwright/shared';
import type { LaborTask } from '@pondwright/shared/engine';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { parseBody } from '../common/validation/parse-body';
import { readOnReplica } from '../database/read-replica';
import type { PriceBookVersionView } from '../price-book/dto/price-book.dto';
import { PriceBookService } from '../price-book/price-book.service';
import { Job } from './entities/job.entity';

/** What the crew really achieves, learned from closed jobs, and adopting it into the price book. */
@Injectable()
export class LearnedRatesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly priceBook: PriceBookService,
  ) {}

  /** The report, read on the replica when there is one (a job closed a moment ago may show later). */
  list(): Promise<LearnedRate[]> {
    return readOnReplica(this.dataSource, (manager) => this.learn(manager));
  }

  private async learn(manager: EntityManager): Promise<LearnedRate[]> {
    // The book in force is one small row, read where it is written: a rate just adopted shows at once.
    const book = await this.priceBook.currentVersion();
    const companyId = this.tenant.companyId;
    const jobs = await manager.find(Job, {
      where: { companyId, status: 'closed' },
    });
    // Hours logged per job and task, summed in the database from every day's entries.
    const rows = (await manager.query(
      `SELECT l.job_id, e->>'task' AS task, sum((e->>'hours')::numeric) AS hours
       FROM job_logs l CROSS JOIN LATERAL jsonb_array_elements(l.entries) AS e
       JOIN jobs j ON j.id = l.job_id
       WHERE l.company_id = $1 AND j.status = 'closed' AND e->>'kind' = 'hours'
       GROUP BY l.job_id, e->>'task'`,
      [companyId],
    )) as Array<{ job_id: string; task: LaborTask; hours: string }>;
    return learnedRates(
      book.content.productionRates,
      jobs.map((job) => ({
        budget: job.budget,
        actualHoursByTask: Object.fromEntries(
          rows.filter((row) => row.job_id === job.id).map((row) => [row.task, Number(row.hours)]),
        ),
      })),
    );
  }

  /** A new price-book version, effective today, with the learned value of one rate. */
  async adopt(body: unknown, authorId: string): Promise<PriceBookVersionView> {
    const { parameter } = parseBody(adoptLearnedRateRequestSchema, body);
    // Decided on the primary: a new price-book version must not be built from a lagging copy.
    const rate = (await this.learn(this.dataSource.manager)).find(
      (candidate) => candidate.parameter === parameter,
    )!;
    if (rate.learnedValue === null) {
      throw new AppError('NOTHING_LEARNED', 'No closed job has taught this rate yet.');
    }
    return this.priceBook.adoptProductionRate(
      parameter,
      rate.learnedValue,
      `Adopted the crew's ${rate.label.toLowerCase()} rate: ${rate.learnedValue} ${rate.unit} from ${rate.jobs} closed job${rate.jobs === 1 ? '' : 's'} (was ${rate.bookValue})`,
      authorId,
    );
  }
}
