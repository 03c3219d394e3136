import { describe, expect, it } from 'vitest';
import { draftOf, restoreDraft } from '../../../storefront/src/features/designer/model/draft.ts';
import { bishopDress } from './support/bishop-dress-setting.ts';
import { freshHistory, run } from './support/run.ts';

const designed = () =>
  run(freshHistory(), 'add-lettering', { text: 'Eliza', font: 'breezy-script', letterHeightMm: 20, thread: 'WB-110' })
    .present;

describe('the draft kept through sign-in', () => {
  it('when a kept draft comes back, then it is the same design, with nothing selected', () => {
    const state = designed();
    const restored = restoreDraft(JSON.stringify(draftOf(state)), bishopDress);
    expect(restored).toEqual({ ...state, selectedId: null });
  });

  it('when nothing was kept, or the text is not a draft, then there is no draft', () => {
    expect(restoreDraft(null, bishopDress)).toBeUndefined();
    expect(restoreDraft('{not json', bishopDress)).toBeUndefined();
    expect(restoreDraft(JSON.stringify({ sizeId: 'big' }), bishopDress)).toBeUndefined();
  });

  it('when the document breaks the contract, then restoreDesign refuses it and the draft is not used', () => {
    const draft = draftOf(designed());
    const withPrice = { ...draft, document: { ...draft.document, totalCents: 100 } };
    expect(restoreDraft(JSON.stringify(withPrice), bishopDress)).toBeUndefined();
  });

  it('when the size or colour is no longer offered, then the draft is not used', () => {
    const draft = draftOf(designed());
    expect(restoreDraft(JSON.stringify({ ...draft, sizeId: 999 }), bishopDress)).toBeUndefined();
    expect(restoreDraft(JSON.stringify({ ...draft, colourId: 999 }), bishopDress)).toBeUndefined();
  });
});
