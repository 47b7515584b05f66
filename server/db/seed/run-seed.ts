import 'reflect-metadata';
import { AppDataSource } from '../data-source';
import { seedDemo } from './demo-seed';

async function main(): Promise<void> {
  await AppDataSource.initialize();
  try {
    const { created } = await seedDemo(AppDataSource);
    console.error(created.length ? `demo data added: ${created.join(', ')}` : 'demo data already present; nothing changed');
  } finally {
    await AppDataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('seeding failed:', error);
  process.exit(1);
});
