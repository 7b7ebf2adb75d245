!> An example Fortran host: reads a profile, completes it through the bridge (thermodynamics, then
!> opacity), runs the stability test and convection with the Jacobian, and compares every value,
!> bit for bit, with the same batch calls made through the Java API (reference.csv, written by
!> ExampleReference). Then it shows one refused zone, numbered from 1 as Fortran counts.
!>
!>   usage: host DIR      (DIR holds models.txt, profile.csv, reference.csv)
!>
!> Prints one line "fortran-host: refused: ..." and one summary line "fortran-host: ... ok" (or
!> "... FAILED"); stops with code 1 unless everything agreed.
program fortran_host
  use, intrinsic :: iso_fortran_env, only: int64, real64
  use startransport
  implicit none

  integer, parameter :: columns = 108, refused_zone = 301
  character(len=4096) :: dir, line
  character(len=2048) :: message
  character(len=32) :: family(4)
  character(len=64) :: name(4)
  character(len=128) :: options(4)
  type(stt_session) :: session
  type(stt_model) :: model(4)
  real(real64), allocatable :: r(:), m(:), t(:), rho(:), p(:), lum(:), x(:), z(:), nabla_mu(:)
  real(real64), allocatable :: thermo(:, :), kappa(:), dlnk_drho(:), dlnk_dt(:)
  real(real64), allocatable :: stab(:, :), stab_jacobian(:, :, :), conv(:, :), jacobian(:, :, :)
  real(real64), allocatable :: ref(:, :), bad_t(:)
  integer, allocatable :: lookup(:), stab_regime(:), regime(:)
  real(real64) :: row(9)
  integer :: n, k, i, o, j, status, unit, io
  integer(int64) :: compared, differing
  logical :: refused_right, ok
  character(len=16) :: expected

  call get_command_argument(1, dir)
  if (len_trim(dir) == 0) then
     write (*, '(a)') 'usage: host DIR'
     stop 2
  end if

  ! models.txt: family, name and options, separated by spaces
  open (newunit=unit, file=trim(dir)//'/models.txt', status='old', action='read')
  do i = 1, 4
     read (unit, '(a)') line
     call split_model(line, family(i), name(i), options(i))
  end do
  close (unit)

  ! profile.csv: one header line, then r, m, T, rho, P, L, X, Z, nabla_mu per zone
  open (newunit=unit, file=trim(dir)//'/profile.csv', status='old', action='read')
  read (unit, '(a)') line
  n = 0
  do
     read (unit, *, iostat=io) row
     if (io /= 0) exit
     n = n + 1
  end do
  allocate (r(n), m(n), t(n), rho(n), p(n), lum(n), x(n), z(n), nabla_mu(n))
  rewind (unit)
  read (unit, '(a)') line
  do k = 1, n
     read (unit, *) r(k), m(k), t(k), rho(k), p(k), lum(k), x(k), z(k), nabla_mu(k)
  end do
  close (unit)

  call stt_open(session, status, message=message)
  if (status /= STT_OK) then
     write (*, '(a)') 'fortran-host: could not open a session: '//trim(message)//': FAILED'
     stop 1
  end if
  do i = 1, 4
     call stt_model_create(session, family(i), name(i), model(i), status, options=options(i), message=message)
     if (status /= STT_OK) then
        write (*, '(a)') 'fortran-host: '//trim(family(i))//' model: '//trim(message)//': FAILED'
        stop 1
     end if
  end do

  ! thermodynamics: mu, beta, P, nabla_ad, c_P, delta, phi, Gamma_1
  allocate (thermo(n, 8))
  call stt_thermodynamics(model(1), t, rho, x, z, status, mu=thermo(:, 1), beta=thermo(:, 2), &
       pressure=thermo(:, 3), nabla_ad=thermo(:, 4), cp=thermo(:, 5), delta=thermo(:, 6), phi=thermo(:, 7), &
       gamma1=thermo(:, 8), message=message)
  call require(status, 'thermodynamics')

  allocate (kappa(n), dlnk_drho(n), dlnk_dt(n), lookup(n))
  call stt_opacity(model(2), t, rho, x, z, status, kappa=kappa, dlnkappa_dlnrho=dlnk_drho, dlnkappa_dlnt=dlnk_dt, &
       lookup=lookup, message=message)
  call require(status, 'opacity')

  allocate (stab(n, 4), stab_regime(n), stab_jacobian(STT_INPUTS, STT_STABILITY_OUTPUTS, n))
  call stt_stability(model(3), m, t, rho, p, lum, kappa, thermo(:, 4), thermo(:, 6), status, &
       nabla_mu=nabla_mu, phi=thermo(:, 7), regime=stab_regime, nabla_rad=stab(:, 1), nabla_ledoux=stab(:, 2), &
       margin_schwarzschild=stab(:, 3), margin_ledoux=stab(:, 4), jacobian=stab_jacobian, message=message)
  call require(status, 'stability')

  allocate (conv(n, 11), regime(n), jacobian(STT_INPUTS, STT_CONVECTION_OUTPUTS, n))
  call stt_convection(model(4), r, m, t, rho, p, lum, kappa, thermo(:, 5), thermo(:, 4), thermo(:, 6), status, &
       nabla_mu=nabla_mu, phi=thermo(:, 7), regime=regime, nabla_rad=conv(:, 1), nabla=conv(:, 2), &
       nabla_element=conv(:, 3), velocity=conv(:, 4), convective_fraction=conv(:, 5), &
       radiative_fraction=conv(:, 6), efficiency=conv(:, 7), loss_parameter=conv(:, 8), &
       scale_height=conv(:, 9), mixing_length=conv(:, 10), diffusion=conv(:, 11), jacobian=jacobian, &
       message=message)
  call require(status, 'convection')

  ! every value against the Java API's
  allocate (ref(columns, n))
  open (newunit=unit, file=trim(dir)//'/reference.csv', status='old', action='read')
  read (unit, '(a)') line
  do k = 1, n
     read (unit, *) ref(:, k)
  end do
  close (unit)
  compared = 0
  differing = 0
  do k = 1, n
     do j = 1, 8
        call check(thermo(k, j), ref(j, k))
     end do
     call check(kappa(k), ref(9, k))
     call check(dlnk_drho(k), ref(10, k))
     call check(dlnk_dt(k), ref(11, k))
     call check(real(lookup(k), real64), ref(12, k))
     call check(real(stab_regime(k), real64), ref(13, k))
     call check(stab(k, 1), ref(14, k))        ! nabla_rad
     call check(thermo(k, 4), ref(15, k))      ! nabla_ad as given (not an output of the Fortran call)
     call check(stab(k, 2), ref(16, k))        ! nabla_L
     call check(stab(k, 3), ref(17, k))
     call check(stab(k, 4), ref(18, k))
     do o = 1, STT_STABILITY_OUTPUTS
        do i = 1, STT_INPUTS
           call check(stab_jacobian(i, o, k), ref(18 + (o - 1) * STT_INPUTS + i, k))
        end do
     end do
     call check(real(regime(k), real64), ref(45, k))
     do j = 1, 11
        call check(conv(k, j), ref(45 + j, k))
     end do
     do o = 1, STT_CONVECTION_OUTPUTS
        do i = 1, STT_INPUTS
           call check(jacobian(i, o, k), ref(56 + (o - 1) * STT_INPUTS + i, k))
        end do
     end do
  end do

  ! one refused zone: a negative temperature in zone refused_zone (Fortran numbering)
  allocate (bad_t(n))
  bad_t = t
  bad_t(refused_zone) = -1.0_real64
  call stt_convection(model(4), r, m, bad_t, rho, p, lum, kappa, thermo(:, 5), thermo(:, 4), thermo(:, 6), &
       status, nabla=conv(:, 2), jacobian=jacobian, message=message)
  write (expected, '(a, i0, a)') 'zone ', refused_zone, ':'
  refused_right = status == STT_INVALID_INPUT .and. index(message, trim(expected)) > 0 .and. &
       index(message, 'temperature') > 0
  write (*, '(a)') 'fortran-host: refused: '//stt_status_name(status)//': '//trim(message)

  do i = 1, 4
     call stt_model_free(model(i))
  end do
  call stt_close(session)

  ok = differing == 0 .and. compared == int(n, int64) * columns .and. refused_right
  write (line, '(a, i0, a, i0, a, i0, a, i0, a)') 'fortran-host: ', n, ' zones through the bridge '// &
       '(thermodynamics, opacity, stability and convection with the Jacobian), ', compared, &
       ' values compared bit for bit with the Java API, ', differing, ' differ; zone ', refused_zone, &
       ' refused by name: '
  if (ok) then
     write (*, '(a)') trim(line)//' ok'
  else
     write (*, '(a)') trim(line)//' FAILED'
     stop 1
  end if

contains

  subroutine check(host, java)
    real(real64), intent(in) :: host, java
    compared = compared + 1
    if (transfer(host, 0_int64) /= transfer(java, 0_int64)) then
       if (differing < 10) write (0, '(a, i0, a, es25.17, a, es25.17)') 'fortran-host differs in zone ', k, &
            ': bridge ', host, ', Java ', java
       differing = differing + 1
    end if
  end subroutine check

  subroutine require(status, what)
    integer, intent(in) :: status
    character(len=*), intent(in) :: what
    if (status /= STT_OK) then
       write (*, '(a)') 'fortran-host: '//what//' through the bridge failed: '//stt_status_name(status)//': '// &
            trim(message)//': FAILED'
       stop 1
    end if
  end subroutine require

  subroutine split_model(text, family, name, options)
    character(len=*), intent(in) :: text
    character(len=*), intent(out) :: family, name, options
    integer :: a, b
    character(len=len(text)) :: rest
    rest = adjustl(text)
    a = index(rest, ' ')
    family = rest(:a - 1)
    rest = adjustl(rest(a:))
    b = index(rest, ' ')
    name = rest(:b - 1)
    options = adjustl(rest(b:))
  end subroutine split_model

end program fortran_host
