import type { MeDto, SignupInput } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { useSignInMutation } from './session';

export const signup = (input: SignupInput) => api.post<MeDto>('/api/auth/signup', input, { authRedirect: false });

export const useSignup = () => useSignInMutation(signup);
