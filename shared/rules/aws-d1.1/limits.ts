import { printed } from '../units'

/** Boundary values of AWS D1.1 welder tables; the SI values are from memory (D1.1M pairs 3/4 in with 20 mm). */
export const d11 = {
  t1_32: printed('1/32', 1),
  t1_8: printed('1/8', 3),
  t3_16: printed('3/16', 5),
  t1_4: printed('1/4', 6),
  t3_8: printed('3/8', 10),
  t3_4: printed('3/4', 20),
  t1: printed('1', 25),
  od3_4: printed('3/4', 20),
  od4: printed('4', 100),
  od24: printed('24', 600),
} as const
