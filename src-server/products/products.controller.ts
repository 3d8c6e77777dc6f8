import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ALL_ROLES } from '../common/roles';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { ProductsService } from './products.service';
import { CreateProductDto, ProductDetailDto, ProductSummaryDto, UpdateProductDto, VersionQueryDto } from './dto/product.dto';
import { CreateRadioDto, RadioDto, UpdateRadioDto } from './dto/radio.dto';

@ApiTags('products')
@Controller('products')
export class ProductsController {
  constructor(private readonly products: ProductsService) {}

  @Get()
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'All products' })
  @ApiOkResponse({ type: [ProductSummaryDto] })
  list(): Promise<ProductSummaryDto[]> {
    return this.products.list();
  }

  @Post()
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Create a product (engineer, admin)' })
  @ApiCreatedResponse({ type: ProductDetailDto })
  create(@Body() body: CreateProductDto, @CurrentUser() actor: AuthUser): Promise<ProductDetailDto> {
    return this.products.create(body, actor);
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One product with its radios and their bands' })
  @ApiOkResponse({ type: ProductDetailDto })
  get(@Param('id', ParseIdPipe) id: number): Promise<ProductDetailDto> {
    return this.products.getWithRadios(id);
  }

  @Patch(':id')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Edit a product; send the version you edited (engineer, admin)' })
  @ApiOkResponse({ type: ProductDetailDto })
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdateProductDto, @CurrentUser() actor: AuthUser): Promise<ProductDetailDto> {
    return this.products.update(id, body, actor);
  }

  @Delete(':id')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a product and its radios (engineer, admin)' })
  @ApiNoContentResponse()
  remove(@Param('id', ParseIdPipe) id: number, @Query() query: VersionQueryDto, @CurrentUser() actor: AuthUser): Promise<void> {
    return this.products.remove(id, query.version, actor);
  }

  @Get(':id/history')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'Every change to the product and its radios, newest first' })
  history(@Param('id', ParseIdPipe) id: number) {
    return this.products.history(id);
  }

  @Get(':id/radios')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The radios of a product' })
  @ApiOkResponse({ type: [RadioDto] })
  listRadios(@Param('id', ParseIdPipe) id: number): Promise<RadioDto[]> {
    return this.products.listRadios(id);
  }

  @Post(':id/radios')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Add a radio to a product (engineer, admin)' })
  @ApiCreatedResponse({ type: RadioDto })
  createRadio(@Param('id', ParseIdPipe) id: number, @Body() body: CreateRadioDto, @CurrentUser() actor: AuthUser): Promise<RadioDto> {
    return this.products.createRadio(id, body, actor);
  }

  @Get(':id/radios/:radioId')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One radio of a product' })
  @ApiOkResponse({ type: RadioDto })
  getRadio(@Param('id', ParseIdPipe) id: number, @Param('radioId', ParseIdPipe) radioId: number): Promise<RadioDto> {
    return this.products.getRadio(id, radioId);
  }

  @Patch(':id/radios/:radioId')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Edit a radio; given bands replace the old list; send the version you edited (engineer, admin)' })
  @ApiOkResponse({ type: RadioDto })
  updateRadio(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Body() body: UpdateRadioDto,
    @CurrentUser() actor: AuthUser,
  ): Promise<RadioDto> {
    return this.products.updateRadio(id, radioId, body, actor);
  }

  @Delete(':id/radios/:radioId')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a radio from a product (engineer, admin)' })
  @ApiNoContentResponse()
  removeRadio(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Query() query: VersionQueryDto,
    @CurrentUser() actor: AuthUser,
  ): Promise<void> {
    return this.products.removeRadio(id, radioId, query.version, actor);
  }
}
