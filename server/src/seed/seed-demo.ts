import type { DataSource } from 'typeorm';
import { hashPassword } from '../auth/passwords';
import { Company } from '../companies/entities/company.entity';
import { addStarterPriceBook } from '../price-book/starter-price-book';
import { User } from '../users/entities/user.entity';
import { DEMO_COMPANY_NAME, DEMO_USERS } from './demo-data';

/**
 * Adds the demo company, its people and its starter price book when they are missing. Idempotent: rows
 * that exist are left exactly as they are, so a user's changes (a new password, a renamed company, a
 * price book of their own) survive every restart.
 */
export async function seedDemo(dataSource: DataSource): Promise<{ created: string[] }> {
  const created: string[] = [];
  await dataSource.transaction(async (manager) => {
    // One seed at a time, even if two start commands race.
    await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', ['pondwright-demo-seed']);
    const owner = await manager.findOneBy(User, { email: DEMO_USERS[0]!.email });
    let companyId = owner?.companyId;
    if (!companyId) {
      const company = await manager.save(manager.create(Company, { name: DEMO_COMPANY_NAME }));
      companyId = company.id;
      created.push(`company ${DEMO_COMPANY_NAME}`);
    }
    for (const person of DEMO_USERS) {
      if (await manager.existsBy(User, { email: person.email })) continue;
      await manager.save(
        manager.create(User, {
          companyId,
          email: person.email,
          name: person.name,
          role: person.role,
          passwordHash: await hashPassword(person.password),
        }),
      );
      created.push(`user ${person.email}`);
    }
    const demoOwner = await manager.findOneByOrFail(User, { email: DEMO_USERS[0]!.email });
    if (await addStarterPriceBook(manager, companyId, demoOwner.id)) created.push('price book');
  });
  return { created };
}
