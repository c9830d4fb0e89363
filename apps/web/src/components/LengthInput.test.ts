import { afterEach, describe, expect, it } from 'vitest';
import { lengthUnits } from '../format';
import { mountWithApp, settle } from '../test/mountWithApp';
import LengthInput from './LengthInput.vue';

afterEach(() => {
  document.body.innerHTML = '';
  lengthUnits.value = 'in';
});

const typeInto = async (w: ReturnType<typeof mountWithApp>, text: string) => {
  const input = w.find('input[data-test=sheet]');
  await input.setValue(text);
  await input.trigger('blur');
  await settle();
};

// 1 in = 25.4 mm exactly (ISO 80000-3), so 762 mm is 30 in and 22 in is 558.8 mm.
describe('LengthInput', () => {
  it('shows and takes millimetres for a metric user, and gives the form inches', async () => {
    lengthUnits.value = 'mm';
    const w = mountWithApp(LengthInput, { value: 22, 'onUpdate:value': () => undefined, 'data-test': 'sheet' });
    expect((w.find('input[data-test=sheet]').element as HTMLInputElement).value).toBe('558.8');
    expect(w.text()).toContain('mm');
    await typeInto(w, '762');
    expect(w.emitted('update:value')!.at(-1)).toEqual([30]);
  });

  it('starts in inches for an inch user and takes inches as typed', async () => {
    const w = mountWithApp(LengthInput, { value: undefined, 'data-test': 'sheet' });
    await typeInto(w, '28.5');
    expect(w.emitted('update:value')!.at(-1)).toEqual([28.5]);
    expect(w.text()).toContain('in');
  });

  it('names its unit for screen readers', () => {
    const w = mountWithApp(LengthInput, { value: 1, unitLabel: 'Unit of the gutter', 'data-test': 'sheet' });
    expect(w.find('[aria-label="Unit of the gutter"]').exists()).toBe(true);
  });

  it('takes a caliper in points or millimetres and gives the form points', async () => {
    const w = mountWithApp(LengthInput, { value: 16, fine: true, 'data-test': 'sheet' });
    expect((w.find('input[data-test=sheet]').element as HTMLInputElement).value).toBe('16');
    expect(w.text()).toContain('pt');
    lengthUnits.value = 'mm';
    const metric = mountWithApp(LengthInput, { value: undefined, fine: true, 'data-test': 'sheet' });
    const input = metric.find('input[data-test=sheet]');
    await input.setValue('0.45');
    await input.trigger('blur');
    await settle();
    // 0.45 mm ÷ 25.4 mm/in = 0.017717 in = 17.717 pt.
    expect(metric.emitted('update:value')!.at(-1)).toEqual([17.717]);
  });
});
