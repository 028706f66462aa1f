import { describe, expect, it } from 'vitest';
import { csvBlob } from '@/components/ladder/ladder-export';

describe('csvBlob', () => {
  it('keeps the rows, starts with a byte-order mark and ends with the caution row', async () => {
    const bytes = new Uint8Array(await csvBlob('Step,ΔG kJ/mol\r\nStep 1,−12.3').arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const lines = new TextDecoder().decode(bytes).split('\r\n');
    expect(lines.slice(0, 2)).toEqual(['Step,ΔG kJ/mol', 'Step 1,−12.3']);
    expect(lines[2]).toMatch(/^Caution,"?Thermodynamic screen only: it says nothing of rates, runaway/);
    expect(lines).toHaveLength(3);
  });
});
