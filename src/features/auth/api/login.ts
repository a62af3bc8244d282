import type { LoginInput, MeDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { useSignInMutation } from './session';

export const login = (input: LoginInput) => api.post<MeDto>('/api/auth/login', input, { authRedirect: false });

export const useLogin = () => useSignInMutation(login);
