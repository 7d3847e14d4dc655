import type { DataSource, EntityManager } from 'typeorm';
import { hashPassword } from '../auth/passwords';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { Site } from '../customers/entities/site.entity';
import { addStarterPriceBook } from '../price-book/starter-price-book';
import { User } from '../users/entities/user.entity';
import { DEMO_COMPANY_NAME, DEMO_USERS } from './demo-data';
import { addDemoEstimates } from './seed-demo-estimates';

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
    const customers = await addDemoCustomers(manager, companyId);
    if (customers) created.push(`${customers} customers`);
    const estimator = await manager.findOneByOrFail(User, { email: DEMO_USERS[1]!.email });
    const estimates = await addDemoEstimates(manager, companyId, estimator.id);
    if (estimates) created.push(`${estimates} estimates`);
  });
  return { created };
}

type DemoSite = Partial<Omit<Site, 'id' | 'companyId' | 'customerId'>> & { addressLine: string };

/** Invented customers in invented towns; any likeness to real people or places is unintended. */
const DEMO_CUSTOMERS: Array<{
  name: string;
  phone: string;
  email: string;
  notes: string;
  sites: DemoSite[];
}> = [
  {
    name: 'Odile Brackenridge',
    phone: '555-0141',
    email: 'odile.b@example.test',
    notes: 'Wants a koi pond visible from the kitchen window.',
    sites: [
      {
        label: 'Back garden',
        addressLine: '14 Alder Row',
        city: 'Fernhollow',
        accessWidthIn: '36',
        carryDistanceFt: '80',
        slopePct: '3',
        soil: 'clay',
        waterAvailable: true,
        powerAvailable: true,
        notes: 'Side gate 36 in; the lawn is soft after rain.',
      },
    ],
  },
  {
    name: 'Tobiah Quillfeather',
    phone: '555-0172',
    email: 'tquill@example.test',
    notes: '',
    sites: [
      {
        addressLine: '7 Sedge Lane',
        city: 'Millbrook Vale',
        accessWidthIn: '60',
        carryDistanceFt: '40',
        slopePct: '8',
        soil: 'loam',
        waterAvailable: true,
        powerAvailable: false,
        utilitiesLocated: true,
      },
    ],
  },
  {
    name: 'Maren Stillwater-Hobb',
    phone: '555-0190',
    email: '',
    notes: 'Call after 5 pm.',
    sites: [
      {
        label: 'Front courtyard',
        addressLine: '22 Heron Close',
        city: 'Ashcombe Reach',
        accessWidthIn: '30',
        carryDistanceFt: '150',
        soil: 'sand-gravel',
        notes: 'Wheelbarrow only through the house passage.',
      },
      { label: 'Cottage', addressLine: '3 Rushwick Lane', city: 'Ashcombe Reach', slopePct: '12' },
    ],
  },
  {
    name: 'Corwin Ashgrove',
    phone: '555-0123',
    email: 'corwin.ashgrove@example.test',
    notes: 'Existing preformed pond to be replaced.',
    sites: [
      { addressLine: '9 Willow Bend', city: 'Fernhollow', soil: 'loam', waterAvailable: true },
    ],
  },
  {
    name: 'Pell & Dunmore Property Care',
    phone: '555-0150',
    email: 'office@pelldunmore.example.test',
    notes: 'Manages several rental gardens; invoices to the office.',
    sites: [
      { label: 'Unit 4', addressLine: '41 Moss Terrace', city: 'Glenharrow', accessWidthIn: '48' },
      { label: 'Unit 9', addressLine: '18 Moss Terrace', city: 'Glenharrow', accessWidthIn: '42' },
    ],
  },
  {
    name: 'Ysolde Marchbank',
    phone: '',
    email: 'ysolde.m@example.test',
    notes: 'Small patio fountain.',
    sites: [{ addressLine: '5 Lantern Yard', city: 'Millbrook Vale', powerAvailable: true }],
  },
  {
    name: 'Bram Thistlewood',
    phone: '555-0177',
    email: '',
    notes: '',
    sites: [
      {
        addressLine: '60 Orchard Rise',
        city: 'Kestle Down',
        slopePct: '18',
        soil: 'clay',
        carryDistanceFt: '220',
        notes: 'Steep back garden; terrace for a stream and two falls.',
      },
    ],
  },
  {
    name: 'Linnea Farrowdale',
    phone: '555-0108',
    email: 'linnea.f@example.test',
    notes: 'Wildlife pond, no fish.',
    sites: [],
  },
];

/** Adds each demo customer (with its sites) that the demo company does not have by name yet. */
async function addDemoCustomers(manager: EntityManager, companyId: string): Promise<number> {
  let added = 0;
  for (const { sites, ...fields } of DEMO_CUSTOMERS) {
    if (await manager.existsBy(Customer, { companyId, name: fields.name })) continue;
    const customer = await manager.save(manager.create(Customer, { ...fields, companyId }));
    for (const site of sites) {
      await manager.save(manager.create(Site, { ...site, companyId, customerId: customer.id }));
    }
    added++;
  }
  return added;
}
