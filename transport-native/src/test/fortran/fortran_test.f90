!> Checks of the Fortran module beyond the example host: arrays that are not contiguous (sections
!> with a stride) give bit for bit the results of contiguous ones, short arrays and a misshapen
!> Jacobian are refused by name, bad zones are numbered from 1, optional arguments may be left out.
!>
!>   usage: fortran_test DIR
!> Prints one line per check, "fortran-test: NAME: pass" or "fortran-test: NAME: FAIL ...", and
!> the closing line "fortran-test: P checks passed, F checks failed".
program fortran_test
  use, intrinsic :: iso_fortran_env, only: int64, real64
  use startransport
  implicit none

  character(len=4096) :: dir, line
  character(len=2048) :: message
  type(stt_session) :: session
  type(stt_model) :: thermo, opacity, mlt
  real(real64), allocatable :: prof(:, :), cp(:), nabla_ad(:), delta(:), kappa(:)
  real(real64), allocatable :: nabla(:), v(:), jac(:, :, :)
  real(real64), allocatable :: wide(:, :), wide_out(:, :), wide_jac(:, :, :), bad_t(:), short(:)
  real(real64) :: row(9)
  integer :: n, k, io, unit, status, passed, failed

  passed = 0
  failed = 0
  call get_command_argument(1, dir)
  open (newunit=unit, file=trim(dir)//'/profile.csv', status='old', action='read')
  read (unit, '(a)') line
  n = 0
  do
     read (unit, *, iostat=io) row
     if (io /= 0) exit
     n = n + 1
  end do
  allocate (prof(n, 9))
  rewind (unit)
  read (unit, '(a)') line
  do k = 1, n
     read (unit, *) prof(k, :)
  end do
  close (unit)

  call stt_open(session, status)
  call expect('open', status == STT_OK, stt_status_name(status))
  call stt_model_create(session, 'thermodynamics', 'ideal-gas-radiation', thermo, status)
  call stt_model_create(session, 'opacity', '', opacity, status, message=message)
  call expect('default opacity model', status == STT_OK, message)
  call stt_model_create(session, 'convection', 'local-mixing-length', mlt, status, options='alpha=2.0', &
       message=message)
  call expect('convection model with options', status == STT_OK, message)
  call stt_model_describe(mlt, line)
  call expect('describe', index(line, 'alpha=2.0') > 0, line)

  allocate (cp(n), nabla_ad(n), delta(n), kappa(n), nabla(n), v(n), jac(STT_INPUTS, STT_CONVECTION_OUTPUTS, n))
  call stt_thermodynamics(thermo, prof(:, 3), prof(:, 4), prof(:, 7), prof(:, 8), status, cp=cp, &
       nabla_ad=nabla_ad, delta=delta)
  call expect('thermodynamics without a message argument', status == STT_OK, stt_status_name(status))
  call stt_opacity(opacity, prof(:, 3), prof(:, 4), prof(:, 7), prof(:, 8), status, kappa=kappa)
  call expect('opacity', status == STT_OK, stt_status_name(status))
  call stt_convection(mlt, prof(:, 1), prof(:, 2), prof(:, 3), prof(:, 4), prof(:, 5), prof(:, 6), kappa, cp, &
       nabla_ad, delta, status, nabla=nabla, velocity=v, jacobian=jac, message=message)
  call expect('convection, contiguous', status == STT_OK, message)

  ! the same zones as every other element of wider arrays, into strided outputs and Jacobian
  allocate (wide(2 * n, 10), wide_out(2, 2 * n), wide_jac(STT_INPUTS, STT_CONVECTION_OUTPUTS, 2 * n))
  wide = -1.0_real64
  wide(1:2 * n:2, 1:6) = prof(:, 1:6)
  wide(1:2 * n:2, 7) = kappa
  wide(1:2 * n:2, 8) = cp
  wide(1:2 * n:2, 9) = nabla_ad
  wide(1:2 * n:2, 10) = delta
  wide_out = 0
  wide_jac = 0
  call stt_convection(mlt, wide(1:2 * n:2, 1), wide(1:2 * n:2, 2), wide(1:2 * n:2, 3), wide(1:2 * n:2, 4), &
       wide(1:2 * n:2, 5), wide(1:2 * n:2, 6), wide(1:2 * n:2, 7), wide(1:2 * n:2, 8), wide(1:2 * n:2, 9), &
       wide(1:2 * n:2, 10), status, nabla=wide_out(1, 1:2 * n:2), velocity=wide_out(2, 2:2 * n:2), &
       jacobian=wide_jac(:, :, 2:2 * n:2), message=message)
  call expect('convection, strided arrays', status == STT_OK, message)
  call expect('strided nabla bit for bit', &
       all(transfer(wide_out(1, 1:2 * n:2), 0_int64, n) == transfer(nabla, 0_int64, n)), '')
  call expect('strided velocity bit for bit', &
       all(transfer(wide_out(2, 2:2 * n:2), 0_int64, n) == transfer(v, 0_int64, n)), '')
  call expect('strided Jacobian bit for bit', all(transfer(wide_jac(:, :, 2:2 * n:2), 0_int64, 52 * n) == &
       transfer(jac, 0_int64, 52 * n)), '')
  call expect('strided Jacobian leaves the other zones alone', all(wide_jac(:, :, 1:2 * n:2) == 0), '')
  call expect('some zone convects', any(v > 0) .and. any(jac(STT_KAPPA, STT_D_VELOCITY, :) /= 0), '')

  ! refusals
  allocate (short(n - 1))
  call stt_convection(mlt, prof(:, 1), prof(:, 2), prof(:, 3), prof(:, 4), prof(:, 5), prof(:, 6), kappa, cp, &
       nabla_ad, delta, status, velocity=short, message=message)
  call expect('short output refused by name', status == STT_BAD_ARGUMENT .and. index(message, 'velocity') > 0, &
       message)
  call stt_convection(mlt, prof(:, 1), prof(:, 2), prof(:, 3), prof(:, 4), prof(:, 5), prof(1:n - 1, 6), kappa, &
       cp, nabla_ad, delta, status, message=message)
  call expect('short input refused by name', status == STT_BAD_ARGUMENT .and. index(message, 'luminosity') > 0, &
       message)
  call stt_convection(mlt, prof(:, 1), prof(:, 2), prof(:, 3), prof(:, 4), prof(:, 5), prof(:, 6), kappa, cp, &
       nabla_ad, delta, status, jacobian=wide_jac(:, 1:3, 1:n), message=message)
  call expect('misshapen Jacobian refused', status == STT_BAD_ARGUMENT .and. index(message, 'jacobian') > 0, &
       message)
  allocate (bad_t(n))
  do k = 1, 2
     bad_t = prof(:, 3)
     bad_t(merge(5, 300, k == 1)) = 0.0_real64
     call stt_convection(mlt, prof(:, 1), prof(:, 2), bad_t, prof(:, 4), prof(:, 5), prof(:, 6), kappa, cp, &
          nabla_ad, delta, status, nabla=nabla, message=message)
     write (line, '(a, i0, a)') 'zone ', merge(5, 300, k == 1), ':'
     call expect('bad zone numbered from 1: '//trim(line), status == STT_INVALID_INPUT .and. &
          index(message, trim(line)) > 0 .and. index(message, 'temperature') > 0, message)
  end do
  call expect('status name', stt_status_name(STT_INVALID_INPUT) == 'STT_INVALID_INPUT', &
       stt_status_name(STT_INVALID_INPUT))
  call stt_model_create(session, 'convection', 'no-such-model', mlt, status, message=message)
  call expect('unknown model', status == STT_UNKNOWN_MODEL .and. index(message, 'local-mixing-length') > 0, &
       message)

  call stt_model_free(thermo)
  call stt_model_free(opacity)
  call stt_close(session)
  write (*, '(a, i0, a, i0, a)') 'fortran-test: ', passed, ' checks passed, ', failed, ' checks failed'
  if (failed > 0) stop 1

contains

  subroutine expect(name, condition, detail)
    character(len=*), intent(in) :: name, detail
    logical, intent(in) :: condition
    if (condition) then
       passed = passed + 1
       write (*, '(a)') 'fortran-test: '//name//': pass'
    else
       failed = failed + 1
       write (*, '(a)') 'fortran-test: '//name//': FAIL '//trim(detail)
    end if
  end subroutine expect

end program fortran_test
