import * as yup from 'yup';

export const ROLE_VALUES = ['owner', 'designer', 'reviewer'] as const;

const email = () => yup.string().trim().lowercase().email('Enter a valid e-mail address').max(254).required('E-mail is required');
const newPassword = () =>
  yup.string().min(10, 'Password needs at least 10 characters').max(200, 'Password is too long').required('Password is required');
const strict = 'Unknown field: ${unknown}';

export const invitationSchema = yup
  .object({
    email: email(),
    role: yup.string().oneOf(ROLE_VALUES, 'Role must be owner, designer or reviewer').required('Role is required'),
  })
  .noUnknown(true, strict);
export type InvitationInput = yup.InferType<typeof invitationSchema>;

export const roleChangeSchema = yup
  .object({ role: yup.string().oneOf(ROLE_VALUES, 'Role must be owner, designer or reviewer').required('Role is required') })
  .noUnknown(true, strict);

/** New accounts give a name and a password; existing accounts confirm with their password. */
export const acceptInvitationSchema = yup
  .object({
    name: yup.string().trim().max(120, 'Name is at most 120 characters').optional(),
    password: yup.string().max(200, 'Password is too long').optional(),
  })
  .noUnknown(true, strict);
export type AcceptInvitationInput = yup.InferType<typeof acceptInvitationSchema>;

export const passwordResetRequestSchema = yup.object({ email: email() }).noUnknown(true, strict);
export const passwordResetSchema = yup.object({ password: newPassword() }).noUnknown(true, strict);
