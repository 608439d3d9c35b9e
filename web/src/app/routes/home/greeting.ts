export function greeting(name: string, now = new Date()): string {
  const h = now.getHours();
  const part = h < 12 ? 'Good morning' : h < 18 ? 'Good afternoon' : 'Good evening';
  const first = name.trim().split(/\s+/)[0] ?? '';
  return first ? `${part}, ${first}` : part;
}
