import { printed } from '../units'

/**
 * The boundary values ASME IX prints, in U.S. customary units with the SI value it pairs with
 * (not an exact conversion: 1/16 in is paired with 1.5 mm, 3/8 in with 10 mm).
 */
export const asme = {
  // Table QW-451.1 bands and limits
  t1_16: printed('1/16', 1.5),
  t3_16: printed('3/16', 5),
  t3_8: printed('3/8', 10),
  t3_4: printed('3/4', 19),
  t1_1_2: printed('1-1/2', 38),
  t6: printed('6', 150),
  t8: printed('8', 200),
  // QW-403.9, QW-403.10, QW-404.32, QW-452.1(b): the 1/2 in (13 mm) limit
  t1_2: printed('1/2', 13),
  // QW-403.6 toughness minimum
  t5_8: printed('5/8', 16),
  t1_4: printed('1/4', 6),
  // QW-452.3 / QW-452.4 / QW-461.9 diameters
  od1: printed('1', 25),
  od2_7_8: printed('2-7/8', 73),
  od24: printed('24', 610),
  // QW-163 bend acceptance; QW-191.1.2.2 radiography
  t1_8: printed('1/8', 3),
  t1_32: printed('1/32', 0.8),
  t2_1_4: printed('2-1/4', 57),
  weld6: printed('6', 150),
} as const
