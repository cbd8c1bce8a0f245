import { signInResponseSchema, type SignInRequest, type SignInResponse } from '@limitbook/contracts';
import { useMutation, type UseMutationOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { session } from '@/lib/session';

export function signIn(body: SignInRequest): Promise<SignInResponse> {
  return api.post('/api/auth/sign-in', body, signInResponseSchema, { anonymous: true });
}

type Options = Omit<UseMutationOptions<SignInResponse, Error, SignInRequest>, 'mutationFn'>;

export function useSignIn(options: Options = {}) {
  return useMutation({
    ...options,
    mutationFn: signIn,
    onSuccess: (...args) => {
      session.signIn(args[0]);
      return options.onSuccess?.(...args);
    },
  });
}
