/** The shop's name as the browser tab ends it (index.html's title says the same before the app starts). */
export const SHOP_TITLE = 'Wren & Bobbin';
