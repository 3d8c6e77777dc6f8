import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { ProductsService } from '../products/products.service';
import { PartDataService } from '../parts/part-data.service';
import { PartAssignment } from './compatibility.entities';
import { DEFAULT_CURRENCY } from './candidates.service';
import type { BillOfMaterialsDto, BomLineDto } from './dto/evaluation.dto';
import { OffersReader } from './sourcing/offers-reader.service';
import { bestOffer, fromScaled, toScaled, totalsByCurrency } from './sourcing/price-at-quantity';

/** The chosen parts of a product, priced at a build quantity from their offers' price breaks. */
@Injectable()
export class BillOfMaterialsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly products: ProductsService,
    private readonly partData: PartDataService,
    private readonly offers: OffersReader,
  ) {}

  async billOfMaterials(productId: number, quantity = 1, currency = DEFAULT_CURRENCY): Promise<BillOfMaterialsDto> {
    const product = await this.products.getWithRadios(productId);
    const chosen = await this.dataSource.getRepository(PartAssignment).find({ where: { productId, state: 'chosen' }, order: { radioId: 'ASC', id: 'ASC' } });
    const radioName = new Map(product.radios.map((r) => [r.id, r.name]));
    // Only radios the product still has: the order of parts follows the radios'.
    const live = chosen.filter((a) => radioName.has(a.radioId));
    const partIds = [...new Set(live.map((a) => a.partId))];
    const [parts, offers] = await Promise.all([this.partData.getPartData(partIds), this.offers.forParts(partIds)]);
    const lines: BomLineDto[] = partIds.map((partId) => {
      const part = parts.find((p) => p.id === partId)!;
      const radios = live.filter((a) => a.partId === partId).map((a) => ({ radioId: a.radioId, name: radioName.get(a.radioId)! }));
      const buyQuantity = quantity * radios.length;
      const offer = bestOffer(offers.get(partId) ?? [], buyQuantity, currency);
      return {
        partId,
        mpn: part.mpn,
        title: part.title,
        manufacturer: part.manufacturer,
        connector: part.connector,
        radios,
        quantityPerUnit: radios.length,
        buyQuantity,
        offer,
        costPerUnit: offer ? fromScaled(toScaled(offer.unitPrice) * BigInt(radios.length)) : null,
      };
    });
    const radiosWithoutPart = product.radios.filter((r) => !live.some((a) => a.radioId === r.id)).map((r) => ({ radioId: r.id, name: r.name }));
    const priced = lines.filter((l) => l.offer !== null);
    const leadTimes = priced.map((l) => l.offer!.leadTimeDays).filter((d): d is number => d !== null);
    return {
      productId,
      productName: product.name,
      quantity,
      currency,
      lines,
      radiosWithoutPart,
      totalPerUnit: totalsByCurrency(priced.map((l) => ({ currency: l.offer!.currency, unitPrice: l.offer!.unitPrice, count: l.quantityPerUnit }))),
      longestLeadTimeDays: leadTimes.length > 0 ? Math.max(...leadTimes) : null,
      complete: radiosWithoutPart.length === 0 && priced.length === lines.length,
    };
  }
}
