import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { HealthResponseDto } from './dto/health-response.dto';
import { HealthErrors } from './health.errors';

const DATABASE_TIMEOUT_MS = 2000;

@Injectable()
export class HealthService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async check(): Promise<HealthResponseDto> {
    let timer: NodeJS.Timeout | undefined;
    try {
      const timeout = new Promise<never>((_, reject) => {
        timer = setTimeout(() => reject(new Error('database timeout')), DATABASE_TIMEOUT_MS);
      });
      await Promise.race([this.dataSource.query('SELECT 1 AS ok'), timeout]);
      return { status: 'ok', database: 'up' };
    } catch {
      throw HealthErrors.databaseDown();
    } finally {
      clearTimeout(timer);
    }
  }
}
