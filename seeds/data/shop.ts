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
  // Delivery at one charge per order, free from 75.00 of goods; or collect from the studio.
  delivery_is_offered: true,
  delivery_flat_cents: 695,
  delivery_free_from_cents: 7500,
  pickup_is_offered: true,
  pickup_note: 'Collect from the studio, 14 Mill Lane, weekdays 10 to 4. We e-mail you when it is ready.',
};
