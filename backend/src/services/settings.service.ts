import type { AppContext } from '../context.js';
import { AppSetting } from '../entities/index.js';

export async function getSetting<T>(ctx: AppContext, key: string): Promise<T | null> {
  const row = await ctx.ds.getRepository(AppSetting).findOneBy({ key });
  return (row?.value as T | undefined) ?? null;
}

export async function putSetting(ctx: AppContext, key: string, value: unknown): Promise<void> {
  await ctx.ds.getRepository(AppSetting).upsert({ key, value: value as object }, ['key']);
}
