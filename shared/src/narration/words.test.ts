import { describe, expect, it } from 'vitest';
import { narrationWords } from './words.js';

function surfaces(text: string, locale: 'en' | 'es'): string[] {
  return narrationWords(text, locale).map((word) => word.surface);
}

describe('narrationWords', () => {
  it('stems English and Spanish plurals to one form', () => {
    const stems = (text: string, locale: 'en' | 'es') => narrationWords(text, locale).map((word) => word.stem);
    expect(stems('tires chambers', 'en')).toEqual(stems('tire chamber', 'en'));
    expect(stems('llantas mangueras', 'es')).toEqual(stems('llanta manguera', 'es'));
  });

  it('reads a spoken tread depth as the fraction of an inch the checklist writes', () => {
    expect(surfaces('four thirty seconds', 'en')).toEqual(['4/32']);
    expect(surfaces('tread depth at least 4 thirty-seconds', 'en')).toEqual(
      surfaces('tread depth at least 4/32', 'en'),
    );
    expect(surfaces('cuatro treintaidosavos', 'es')).toEqual(['4/32']);
    expect(surfaces('dibujo de 4/32 de pulgada', 'es')).toEqual(['dibujo', 'de', '4/32', 'de', 'pulgada']);
  });

  it('writes whole numbers, decimals and mixed numbers as digits', () => {
    expect(surfaces('axle two at one hundred ten psi', 'en')).toEqual(['axle', '2', 'at', '110', 'psi']);
    expect(surfaces('free play under 5.25 inches', 'en')).toEqual(['free', 'play', 'under', '5.25', 'inches']);
    expect(surfaces('one and three quarters', 'en')).toEqual(['1-3/4']);
  });

  it('keeps an article alone as a word', () => {
    expect(surfaces('a tire with an air leak', 'en')).toEqual(['a', 'tire', 'with', 'an', 'air', 'leak']);
    expect(surfaces('una llanta', 'es')).toEqual(['una', 'llanta']);
  });
});
