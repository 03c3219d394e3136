/** The demo studio's settings row (shop_settings has exactly one row, id 1). */
export const shopSettings = {
  id: 1,
  name: 'Wren & Bobbin Embroidery Studio',
  contact_email: 'studio@wrenandbobbin.test',
  currency: 'USD',
  country_code: 'US',
  timezone: 'America/Chicago',
  // A single-needle home machine run a little below its top speed.
  machine_stitches_per_minute: 650,
  minutes_per_colour_change: 0.5,
  minutes_per_hooping: 4,
  setup_minutes: 10,
};
