import { STORES_ITEM_NAME_MAX_LENGTH } from '@catline/contracts';
import { applyDecorators } from '@nestjs/common';
import { ApiProperty, type ApiPropertyOptions } from '@nestjs/swagger';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { PlainText } from './plain-text.decorator.js';
import { Trim } from './trim.decorator.js';

/**
 * The name of a stores item: the key of a type's stores catalogue, and how a slot's stores line picks an item from it.
 * One rule for both, so a name the catalogue takes is always one a load can name; each keeps its own words.
 */
export const StoresItemNameField = (emptyMessage: string, document: ApiPropertyOptions) =>
  applyDecorators(
    ApiProperty(document),
    Trim(),
    IsString(),
    IsNotEmpty({ message: emptyMessage }),
    PlainText(),
    MaxLength(STORES_ITEM_NAME_MAX_LENGTH),
  );
