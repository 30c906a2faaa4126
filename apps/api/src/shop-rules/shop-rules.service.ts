import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { defaultShopRules, migrateShopRules, shopRuleOrigins, type ShopRules } from '@linesmith/routing';
import type { Repository } from 'typeorm';
import { ConflictError } from '../common/errors/app-error.js';
import { isUniqueViolation } from '../common/errors/unique-violation.js';
import type { PutShopRules, ShopRulesDto } from './dto/shop-rules.dto.js';
import { ShopRulesEntity } from './shop-rules.entity.js';

/** The shop's thresholds for the rules engine; a shop without a saved row runs on the defaults. */
@Injectable()
export class ShopRulesService {
  /** The last parsed rules of each shop with the stored text they came from (never shared across shops). */
  private readonly parsed = new Map<string, { json: string; rules: ShopRules }>();

  constructor(@InjectRepository(ShopRulesEntity) private readonly shopRules: Repository<ShopRulesEntity>) {}

  /** The rules the engine should use for this shop. */
  async rulesOf(shopId: string): Promise<ShopRules> {
    return (await this.get(shopId)).rules;
  }

  /**
   * The rules stored as `json` (the jsonb column as text; null when the shop saved none), parsed
   * once per distinct text: the check reads the text with its other inputs in one round trip.
   */
  rulesFromStored(shopId: string, json: string | null): ShopRules {
    if (json === null) return defaultShopRules;
    const hit = this.parsed.get(shopId);
    if (hit?.json === json) return hit.rules;
    // Parsed again on read: rules added to the schema later take their defaults in old rows.
    const rules = migrateShopRules(JSON.parse(json));
    this.parsed.set(shopId, { json, rules });
    return rules;
  }

  async get(shopId: string): Promise<ShopRulesDto> {
    return this.toDto(await this.shopRules.findOneBy({ shopId }));
  }

  /**
   * Saves the whole set against `version` (0 when the shop has no saved rules yet). A stale
   * version, or a concurrent first save, answers 409 with the current rules.
   */
  async put(shopId: string, userId: string, input: PutShopRules): Promise<ShopRulesDto> {
    const current = await this.shopRules.findOneBy({ shopId });
    if ((current?.version ?? 0) !== input.version) throw await this.stale(shopId);
    if (!current) {
      try {
        await this.shopRules.insert({ shopId, rules: input.rules, updatedBy: userId, version: 1 });
      } catch (error) {
        if (isUniqueViolation(error)) throw await this.stale(shopId);
        throw error;
      }
    } else {
      // TypeORM bumps the version column on every update.
      const result = await this.shopRules.update({ shopId, version: input.version }, { rules: input.rules, updatedBy: userId });
      if (!result.affected) throw await this.stale(shopId);
    }
    return this.get(shopId);
  }

  private toDto(row: ShopRulesEntity | null): ShopRulesDto {
    return {
      // Parsed again on read: rules added to the schema later take their defaults in old rows.
      rules: row ? migrateShopRules(row.rules) : defaultShopRules,
      defaults: defaultShopRules,
      origins: shopRuleOrigins,
      version: row?.version ?? 0,
      updatedAt: row ? row.updatedAt.toISOString() : null,
    };
  }

  private async stale(shopId: string): Promise<ConflictError> {
    return new ConflictError('The shop rules were changed by someone else. Review the current values and try again.', {
      current: await this.get(shopId),
    });
  }
}
