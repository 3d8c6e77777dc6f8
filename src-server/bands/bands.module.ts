import { Module } from '@nestjs/common';
import { BandsController } from './bands.controller';
import { BandsService } from './bands.service';
import { BandSetsController } from './band-sets.controller';
import { BandSetsService } from './band-sets.service';

@Module({ controllers: [BandsController, BandSetsController], providers: [BandsService, BandSetsService], exports: [BandsService, BandSetsService] })
export class BandsModule {}
