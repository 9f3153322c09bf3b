export async function main(args: string[]): Promise<number> {
  console.log('stub', args);
  return 0;
}
