import { Module } from '@nestjs/common';
import { RegulatoryLimitsController } from './regulatory-limits.controller';
import { RegulatoryLimitsService } from './regulatory-limits.service';

@Module({ controllers: [RegulatoryLimitsController], providers: [RegulatoryLimitsService], exports: [RegulatoryLimitsService] })
export class RegulatoryModule {}
