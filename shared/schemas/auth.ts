import { z } from 'zod'

export const signInSchema = z.object({
  email: z.string({ required_error: 'Enter your e-mail address' }).trim().min(1, 'Enter your e-mail address').max(254).email('Enter a valid e-mail address'),
  password: z.string({ required_error: 'Enter your password' }).min(1, 'Enter your password').max(200, 'At most 200 characters'),
})
export type SignIn = z.infer<typeof signInSchema>
