/**
 * UI pieces shared by the portal and the staff app. Import from "#shared/ui/index":
 * the "#shared/*" subpath maps to ".ts" files, so this barrel is how .tsx components are reached.
 */
export { apiFetch, ApiRequestError, isApiRequestError, errorMessage, type ApiFetchOptions, type HttpMethod } from "./api-client.ts";
export { createQueryClient } from "./query-client.ts";
export { applyServerErrors } from "./form-errors.ts";
export { useDocumentTitle } from "./use-document-title.ts";
export { AppShell, type AppShellProps, type NavItem } from "./app-shell.tsx";
export { Page, type PageProps } from "./page.tsx";
export { Button, buttonClasses, Spinner, type ButtonProps, type ButtonVariant } from "./button.tsx";
export { TextField, type TextFieldProps } from "./field.tsx";
export { Notice, type NoticeProps, type NoticeTone } from "./notice.tsx";
export { LoadingState, ErrorState, EmptyState, type ErrorStateProps, type EmptyStateProps } from "./states.tsx";
export { LinkifiedText, safeHttpUrl, splitLinks, type TextPart } from "./linkified-text.tsx";
export { SproutMark } from "./sprout-mark.tsx";
export { meQueryKey, meQueryOptions, getMe, useMe, useSignedInUser, firstName } from "./session/get-me.ts";
export { useSignOut, useSignOutEverywhere } from "./session/sign-out.ts";
export { RequireSignIn, type RequireSignInProps } from "./session/require-sign-in.tsx";
export { roleLabel } from "./role-label.ts";
export { SignOutButton } from "./session/sign-out-button.tsx";
export { SignOutEverywhereButton, type SignOutEverywhereWords } from "./session/sign-out-everywhere-button.tsx";
export { NotFoundPage, RouteErrorPage } from "./route-error.tsx";
export { Dialog, type DialogProps } from "./dialog.tsx";
export { ConfirmDialog, type ConfirmDialogProps } from "./confirm-dialog.tsx";
export { SelectField, type SelectFieldProps, type SelectOption } from "./select-field.tsx";
export { CheckboxField, type CheckboxFieldProps } from "./checkbox-field.tsx";
export { TextAreaField, type TextAreaFieldProps } from "./textarea-field.tsx";
export { RequireRole, type RequireRoleProps } from "./session/require-role.tsx";
export { apiPostForm } from "./api-upload.ts";
export { formatCalendarDay, todayInZone, localToday, relativeDay, waitingTime } from "./calendar-days.ts";
export { describePlanDay, type PlanDay } from "./plan-day.ts";
export { FieldError } from "./field-error.tsx";
export { LAWN_CONDITION_LABELS, SERVICE_LABELS, SHADE_LABELS, SLOPE_LABELS, serviceLabel, speciesLabel } from "./service-labels.ts";
export { useDebouncedValue } from "./use-debounced-value.ts";
export { LabelledField, controlBorder, useFieldIds, type FieldIds } from "./labelled-field.tsx";
