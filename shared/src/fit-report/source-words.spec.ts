import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../fixtures/demo-fit-spec';
import { runFitCheck } from './fit-report';
import { customerSourceWords } from './source-words';

describe('threshold sources in customer words', () => {
  it('keeps saying a limit has no published source, in the shop\'s words', () => {
    expect(customerSourceWords('Common practice (no published source): an inch of spline engagement left at full extension.')).toBe(
      'Shop rule of thumb, not a published standard: an inch of spline engagement left at full extension.',
    );
    expect(customerSourceWords("The engine's rated fuel pressure; the regulator within a few psi of it (common practice, no published source).")).toBe(
      "The engine's rated fuel pressure; the regulator within a few psi of it (a shop rule of thumb, not a published standard).",
    );
    expect(customerSourceWords('Critical speed from the size and length of the shaft; keep shaft speed at or under 75 % of critical (common practice).')).toBe(
      'Critical speed from the size and length of the shaft; keep shaft speed at or under 75 % of critical (a shop rule of thumb).',
    );
    expect(customerSourceWords('Published EFI sizing: injector flow = HP × BSFC / (cylinders × maximum duty).')).toBe(
      'Published EFI sizing: injector flow = HP × BSFC / (cylinders × maximum duty).',
    );
  });

  it('leaves no internal marker in any check of the demo reports, and names every rule of thumb as one', () => {
    const findings = [runFitCheck(DEMO_FIT_SPEC), runFitCheck({ ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN })].flatMap((r) => r.findings);
    const marked = findings.filter((f) => /common practice/i.test(f.thresholdSource));
    expect(marked.length).toBeGreaterThan(5);
    for (const f of marked) {
      const words = customerSourceWords(f.thresholdSource);
      expect(words).not.toMatch(/common practice|no published source/i);
      expect(words).toMatch(/rule of thumb/i);
    }
  });
});
