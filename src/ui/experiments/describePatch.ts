/** A merge patch in one line: "warming = [[0,0],[80,1]]; massBalance.ela = 2880". */
export function describePatch(set: Record<string, unknown>, prefix = ''): string {
  const parts: string[] = [];
  for (const [key, value] of Object.entries(set)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) parts.push(describePatch(value as Record<string, unknown>, path));
    else parts.push(value === null ? `${path} removed` : `${path} = ${JSON.stringify(value)}`);
  }
  return parts.filter(Boolean).join('; ');
}
