import { Anchor, Button, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { loginSchema } from '@pondwright/shared';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { useSignIn } from '../api/sign-in';

export function SignInForm() {
  const form = useSchemaForm(loginSchema, { email: '', password: '' });
  const signIn = useSignIn();

  const submit = form.onSubmit((values) =>
    signIn.mutate(values, {
      onError: (error) => applyApiErrorToForm(form, error, 'Could not sign you in'),
    }),
  );

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="email"
          required
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          autoComplete="current-password"
          required
          {...form.getInputProps('password')}
        />
        <Button type="submit" loading={signIn.isPending} fullWidth mt="xs">
          Sign in
        </Button>
        <Text size="sm" c="dimmed" ta="center">
          New to Pondwright?{' '}
          <Anchor component={Link} to={paths.signUp.getHref()} fw={600}>
            Set up your company
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}
