import { Anchor, Button, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { PASSWORD_MIN_LENGTH, signupSchema } from '@pondwright/shared';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { useSignUp } from '../api/sign-up';

export function SignUpForm() {
  const form = useSchemaForm(signupSchema, {
    companyName: '',
    name: '',
    email: '',
    password: '',
  });
  const signUp = useSignUp();

  const submit = form.onSubmit((values) =>
    signUp.mutate(values, {
      onError: (error) => applyApiErrorToForm(form, error, 'Could not create the account'),
    }),
  );

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        <TextInput
          label="Company name"
          autoComplete="organization"
          required
          {...form.getInputProps('companyName')}
        />
        <TextInput label="Your name" autoComplete="name" required {...form.getInputProps('name')} />
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="email"
          required
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          description={`At least ${PASSWORD_MIN_LENGTH} characters. A short phrase is easy to remember.`}
          autoComplete="new-password"
          required
          {...form.getInputProps('password')}
        />
        <Button type="submit" loading={signUp.isPending} fullWidth mt="xs">
          Create account
        </Button>
        <Text size="sm" c="dimmed" ta="center">
          Already on Pondwright?{' '}
          <Anchor component={Link} to={paths.signIn.getHref()} fw={600}>
            Sign in
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}
