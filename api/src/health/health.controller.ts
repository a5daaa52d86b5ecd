import { Controller, Get, Header, HttpStatus, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { DataSource } from 'typeorm';
import { Public } from '../auth/public.decorator';
import { API_VERSION } from '../config/version';
import { HealthDto } from './health.dto';

/** How long the database gets to answer `SELECT 1` before it counts as down. */
const DATABASE_TIMEOUT_MS = 2000;

/** Liveness and database reachability, for monitors and the PWA's online indicator. */
@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly dataSource: DataSource) {}

  @Public()
  @Get()
  @Header('Cache-Control', 'no-store')
  @ApiOperation({ summary: 'Is the API up, and can it reach its database?' })
  @ApiOkResponse({ type: HealthDto })
  @ApiServiceUnavailableResponse({ type: HealthDto, description: 'The database is down' })
  async check(@Res({ passthrough: true }) response: Response): Promise<HealthDto> {
    const databaseUp = await this.isDatabaseUp();
    if (!databaseUp) response.status(HttpStatus.SERVICE_UNAVAILABLE);
    return { status: databaseUp ? 'ok' : 'degraded', database: databaseUp ? 'up' : 'down', version: API_VERSION };
  }

  private async isDatabaseUp(): Promise<boolean> {
    if (!this.dataSource.isInitialized) return false;
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<false>((resolve) => {
      timer = setTimeout(() => resolve(false), DATABASE_TIMEOUT_MS);
    });
    try {
      return await Promise.race([this.dataSource.query('SELECT 1').then(() => true), timeout]);
    } catch {
      return false;
    } finally {
      clearTimeout(timer);
    }
  }
}
