import * as yup from 'yup';

/** Shared by the sign-in form and `POST /api/session`. */
export const signInSchema = yup
  .object({
    email: yup.string().trim().lowercase().email('Enter a valid e-mail address').max(254).required('E-mail is required'),
    password: yup.string().max(200, 'Password is too long').required('Password is required'),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');

export type SignInInput = yup.InferType<typeof signInSchema>;

/** Shared by the sign-up form and `POST /api/accounts`. */
export const signUpSchema = yup
  .object({
    name: yup.string().trim().min(1, 'Name is required').max(120, 'Name is at most 120 characters').required('Name is required'),
    email: yup.string().trim().lowercase().email('Enter a valid e-mail address').max(254).required('E-mail is required'),
    password: yup
      .string()
      .min(10, 'Password needs at least 10 characters')
      .max(200, 'Password is too long')
      .required('Password is required'),
    teamName: yup
      .string()
      .trim()
      .min(1, 'Team name is required')
      .max(120, 'Team name is at most 120 characters')
      .required('Team name is required'),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');

export type SignUpInput = yup.InferType<typeof signUpSchema>;
