import { Injectable } from '@nestjs/common';
import { createCrewRequestSchema, type CrewView } from '@pondwright/shared';
import { AppError } from '../common/errors/app-error';
import { TenantRepositories, type TenantRepository } from '../common/tenancy/tenant-repository';
import { parseBody } from '../common/validation/parse-body';
import { User } from '../users/entities/user.entity';
import { Crew } from './entities/crew.entity';

@Injectable()
export class CrewsService {
  private readonly crews: TenantRepository<Crew>;
  private readonly users: TenantRepository<User>;

  constructor(repositories: TenantRepositories) {
    this.crews = repositories.for(Crew);
    this.users = repositories.for(User);
  }

  async list(): Promise<CrewView[]> {
    const crews = await this.crews.find({ relations: { lead: true }, order: { name: 'ASC' } });
    return crews.map(crewView);
  }

  async create(body: unknown): Promise<CrewView> {
    const request = parseBody(createCrewRequestSchema, body);
    const leadUserId = request.leadUserId ?? null;
    if (leadUserId) await this.users.getById(leadUserId, 'Crew lead');
    const exists = (await this.crews.find()).some(
      (crew) => crew.name.toLowerCase() === request.name.toLowerCase(),
    );
    if (exists) {
      throw new AppError('CREW_NAME_TAKEN', 'There is already a crew of that name.', [
        { field: 'name', message: 'Choose another name' },
      ]);
    }
    const saved = await this.crews.save(this.crews.create({ name: request.name, leadUserId }));
    const [crew] = await this.crews.find({ where: { id: saved.id }, relations: { lead: true } });
    return crewView(crew!);
  }
}

export function crewView(crew: Crew): CrewView {
  return {
    id: crew.id,
    name: crew.name,
    leadUserId: crew.leadUserId,
    leadName: crew.lead?.name ?? null,
  };
}
