!> Fortran 2003 interface to startransport (stellar energy transport), over its C interface
!> (startransport.h, libstartransport.so).
!>
!> Arrays are assumed-shape real(c_double) (real(8) with gfortran); the number of zones of a call
!> is size(temperature), and every other array of the call holds at least that many. Optional
!> outputs that are absent are not computed into the host's memory; optional inputs that are
!> absent take their defaults (nabla_mu = 0, phi = 1). Every call sets an integer status
!> (STT_OK = 0 on success) and, when given, a message that names the field, the value, the unit and
!> the zone, counting zones from 1 as Fortran does. Jacobians are jacobian(input, output, zone),
!> with the 1-based indices below, e.g. jacobian(STT_KAPPA, STT_D_VELOCITY, k).
!>
!> Compile this file with the host, e.g.
!>   gfortran -c startransport.f90 && gfortran host.f90 startransport.o -L<dir> -lstartransport -Wl,-rpath,<dir>
!> where <dir> holds libstartransport.so and, beside it, the library's jars.
module startransport
  use, intrinsic :: iso_c_binding, only: c_int, c_double, c_char, c_ptr, c_null_ptr, c_null_char, c_size_t, &
       c_loc, c_associated, c_f_pointer
  implicit none
  private

  ! Status codes, as in startransport.h.
  integer, parameter, public :: STT_OK = 0, STT_INVALID_INPUT = 1, STT_INVALID_OPTION = 2, &
       STT_UNKNOWN_MODEL = 3, STT_DATA_FORMAT = 4, STT_NO_JVM = 5, STT_NO_CLASSES = 6, STT_BAD_ARGUMENT = 7, &
       STT_JAVA_ERROR = 8, STT_NO_MEMORY = 9, STT_NO_THREAD = 10
  ! Regime codes.
  integer, parameter, public :: STT_RADIATIVE = 0, STT_CONVECTIVE = 1, STT_SEMICONVECTIVE = 2, &
       STT_THERMOHALINE = 3
  ! Opacity lookup codes.
  integer, parameter, public :: STT_INSIDE = 0, STT_CLAMPED = 1, STT_EXTRAPOLATED = 2
  ! Inputs of a derivative: first index of a Jacobian (1-based).
  integer, parameter, public :: STT_T = 1, STT_RHO = 2, STT_P = 3, STT_L = 4, STT_M = 5, STT_R = 6, &
       STT_KAPPA = 7, STT_CP = 8, STT_NABLA_AD = 9, STT_DELTA = 10, STT_NABLA_MU = 11, STT_PHI = 12, &
       STT_ALPHA = 13, STT_INPUTS = 13
  ! Outputs of the convection Jacobian: its second index.
  integer, parameter, public :: STT_D_NABLA = 1, STT_D_VELOCITY = 2, STT_D_CONVECTIVE_FRACTION = 3, &
       STT_D_DIFFUSION = 4, STT_CONVECTION_OUTPUTS = 4
  ! Outputs of the stability Jacobian: its second index.
  integer, parameter, public :: STT_D_NABLA_RAD = 1, STT_D_NABLA_LEDOUX = 2, STT_STABILITY_OUTPUTS = 2

  !> An open session (one per host; the JVM behind it lives until the program ends).
  type, public :: stt_session
     type(c_ptr) :: handle = c_null_ptr
  end type stt_session

  !> A model made by stt_model_create (immutable, shared by threads).
  type, public :: stt_model
     type(c_ptr) :: handle = c_null_ptr
  end type stt_model

  public :: stt_open, stt_close, stt_model_create, stt_model_free, stt_model_describe, stt_status_name
  public :: stt_thermodynamics, stt_opacity, stt_stability, stt_convection

  integer, parameter :: MESSAGE_CAPACITY = 2048

  type, bind(c) :: c_zones
     type(c_ptr) :: radius, mass, temperature, density, pressure, luminosity, opacity, cp, nabla_ad, delta, &
          nabla_mu, phi, hydrogen, metals
  end type c_zones

  type, bind(c) :: c_thermo_out
     type(c_ptr) :: mu, beta, pressure, nabla_ad, cp, delta, phi, gamma1
  end type c_thermo_out

  type, bind(c) :: c_opacity_out
     type(c_ptr) :: kappa, dlnkappa_dlnrho, dlnkappa_dlnt, status
  end type c_opacity_out

  type, bind(c) :: c_stability_out
     type(c_ptr) :: regime, nabla_rad, nabla_ad, nabla_ledoux, margin_schwarzschild, margin_ledoux
  end type c_stability_out

  type, bind(c) :: c_convection_out
     type(c_ptr) :: regime, nabla_rad, nabla, nabla_element, velocity, convective_fraction, radiative_fraction, &
          efficiency, loss_parameter, scale_height, mixing_length, diffusion
  end type c_convection_out

  interface
     function c_open(jvm_library, class_path, zone_origin, session, message, message_size) &
          bind(c, name='stt_open') result(status)
       import :: c_int, c_ptr, c_char, c_size_t
       character(kind=c_char), intent(in) :: jvm_library(*), class_path(*)
       integer(c_int), value :: zone_origin
       type(c_ptr), intent(out) :: session
       character(kind=c_char), intent(out) :: message(*)
       integer(c_size_t), value :: message_size
       integer(c_int) :: status
     end function c_open

     subroutine c_close(session) bind(c, name='stt_close')
       import :: c_ptr
       type(c_ptr), value :: session
     end subroutine c_close

     function c_model_create(session, family, name, options, model, message, message_size) &
          bind(c, name='stt_model_create') result(status)
       import :: c_int, c_ptr, c_char, c_size_t
       type(c_ptr), value :: session
       character(kind=c_char), intent(in) :: family(*), name(*), options(*)
       type(c_ptr), intent(out) :: model
       character(kind=c_char), intent(out) :: message(*)
       integer(c_size_t), value :: message_size
       integer(c_int) :: status
     end function c_model_create

     subroutine c_model_free(model) bind(c, name='stt_model_free')
       import :: c_ptr
       type(c_ptr), value :: model
     end subroutine c_model_free

     function c_model_describe(model, text, text_size) bind(c, name='stt_model_describe') result(status)
       import :: c_int, c_ptr, c_char, c_size_t
       type(c_ptr), value :: model
       character(kind=c_char), intent(out) :: text(*)
       integer(c_size_t), value :: text_size
       integer(c_int) :: status
     end function c_model_describe

     function c_status_name(status) bind(c, name='stt_status_name') result(name)
       import :: c_int, c_ptr
       integer(c_int), value :: status
       type(c_ptr) :: name
     end function c_status_name

     function c_thermodynamics(model, n, zones, out, message, message_size) &
          bind(c, name='stt_thermodynamics') result(status)
       import :: c_int, c_ptr, c_char, c_size_t, c_zones, c_thermo_out
       type(c_ptr), value :: model
       integer(c_int), value :: n
       type(c_zones), intent(in) :: zones
       type(c_thermo_out), intent(in) :: out
       character(kind=c_char), intent(out) :: message(*)
       integer(c_size_t), value :: message_size
       integer(c_int) :: status
     end function c_thermodynamics

     function c_opacity(model, n, zones, out, message, message_size) bind(c, name='stt_opacity') result(status)
       import :: c_int, c_ptr, c_char, c_size_t, c_zones, c_opacity_out
       type(c_ptr), value :: model
       integer(c_int), value :: n
       type(c_zones), intent(in) :: zones
       type(c_opacity_out), intent(in) :: out
       character(kind=c_char), intent(out) :: message(*)
       integer(c_size_t), value :: message_size
       integer(c_int) :: status
     end function c_opacity

     function c_stability(model, n, zones, out, jacobian, message, message_size) &
          bind(c, name='stt_stability') result(status)
       import :: c_int, c_ptr, c_char, c_size_t, c_zones, c_stability_out
       type(c_ptr), value :: model
       integer(c_int), value :: n
       type(c_zones), intent(in) :: zones
       type(c_stability_out), intent(in) :: out
       type(c_ptr), value :: jacobian
       character(kind=c_char), intent(out) :: message(*)
       integer(c_size_t), value :: message_size
       integer(c_int) :: status
     end function c_stability

     function c_convection(model, n, zones, out, jacobian, message, message_size) &
          bind(c, name='stt_convection') result(status)
       import :: c_int, c_ptr, c_char, c_size_t, c_zones, c_convection_out
       type(c_ptr), value :: model
       integer(c_int), value :: n
       type(c_zones), intent(in) :: zones
       type(c_convection_out), intent(in) :: out
       type(c_ptr), value :: jacobian
       character(kind=c_char), intent(out) :: message(*)
       integer(c_size_t), value :: message_size
       integer(c_int) :: status
     end function c_convection
  end interface

contains

  !> Opens a session: starts the JVM inside the program (or attaches to one already there) and
  !> finds the library. See startransport.h for where the JVM and the jars are looked for.
  subroutine stt_open(session, status, jvm_library, class_path, message)
    type(stt_session), intent(out) :: session
    integer, intent(out) :: status
    character(len=*), intent(in), optional :: jvm_library, class_path
    character(len=*), intent(out), optional :: message
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    status = c_open(c_text(jvm_library), c_text(class_path), 1_c_int, session%handle, buffer, &
         int(MESSAGE_CAPACITY, c_size_t))
    if (present(message)) call from_c(buffer, message)
  end subroutine stt_open

  !> Closes a session (free its models first).
  subroutine stt_close(session)
    type(stt_session), intent(inout) :: session
    if (c_associated(session%handle)) call c_close(session%handle)
    session%handle = c_null_ptr
  end subroutine stt_close

  !> Creates a model by family ("stability", "thermodynamics", "convection", "opacity"), name (as
  !> `startransport models` lists them; blank for the default) and options ("alpha=1.8,criterion=ledoux").
  subroutine stt_model_create(session, family, name, model, status, options, message)
    type(stt_session), intent(in) :: session
    character(len=*), intent(in) :: family, name
    type(stt_model), intent(out) :: model
    integer, intent(out) :: status
    character(len=*), intent(in), optional :: options
    character(len=*), intent(out), optional :: message
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    status = c_model_create(session%handle, c_text(family), c_text(name), c_text(options), model%handle, buffer, &
         int(MESSAGE_CAPACITY, c_size_t))
    if (present(message)) call from_c(buffer, message)
  end subroutine stt_model_create

  !> Frees a model.
  subroutine stt_model_free(model)
    type(stt_model), intent(inout) :: model
    if (c_associated(model%handle)) call c_model_free(model%handle)
    model%handle = c_null_ptr
  end subroutine stt_model_free

  !> The model's name and options.
  subroutine stt_model_describe(model, text)
    type(stt_model), intent(in) :: model
    character(len=*), intent(out) :: text
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    integer(c_int) :: status
    status = c_model_describe(model%handle, buffer, int(MESSAGE_CAPACITY, c_size_t))
    call from_c(buffer, text)
  end subroutine stt_model_describe

  !> The name of a status code, e.g. "STT_INVALID_INPUT".
  function stt_status_name(status) result(name)
    integer, intent(in) :: status
    character(len=:), allocatable :: name
    character(kind=c_char), pointer :: chars(:)
    integer :: i
    call c_f_pointer(c_status_name(int(status, c_int)), chars, [32])
    i = 0
    do while (i < 32)
       if (chars(i + 1) == c_null_char) exit
       i = i + 1
    end do
    allocate(character(len=i) :: name)
    do i = 1, len(name)
       name(i:i) = chars(i)
    end do
  end function stt_status_name

  !> Thermodynamics of size(temperature) zones.
  subroutine stt_thermodynamics(model, temperature, density, hydrogen, metals, status, mu, beta, pressure, &
       nabla_ad, cp, delta, phi, gamma1, message)
    type(stt_model), intent(in) :: model
    real(c_double), intent(in) :: temperature(:), density(:), hydrogen(:), metals(:)
    integer, intent(out) :: status
    real(c_double), intent(out), optional :: mu(:), beta(:), pressure(:), nabla_ad(:), cp(:), delta(:), phi(:), &
         gamma1(:)
    character(len=*), intent(out), optional :: message
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    integer :: n
    n = size(temperature)
    buffer(1) = c_null_char
    status = STT_OK
    call check(n, size(density), 'density', status, buffer)
    call check(n, size(hydrogen), 'hydrogen', status, buffer)
    call check(n, size(metals), 'metals', status, buffer)
    if (present(mu)) call check(n, size(mu), 'mu', status, buffer)
    if (present(beta)) call check(n, size(beta), 'beta', status, buffer)
    if (present(pressure)) call check(n, size(pressure), 'pressure', status, buffer)
    if (present(nabla_ad)) call check(n, size(nabla_ad), 'nabla_ad', status, buffer)
    if (present(cp)) call check(n, size(cp), 'cp', status, buffer)
    if (present(delta)) call check(n, size(delta), 'delta', status, buffer)
    if (present(phi)) call check(n, size(phi), 'phi', status, buffer)
    if (present(gamma1)) call check(n, size(gamma1), 'gamma1', status, buffer)
    if (status == STT_OK .and. n > 0) then
       call thermodynamics_worker(model%handle, n, temperature, density, hydrogen, metals, status, buffer, &
            mu, beta, pressure, nabla_ad, cp, delta, phi, gamma1)
    end if
    if (present(message)) call from_c(buffer, message)
  end subroutine stt_thermodynamics

  subroutine thermodynamics_worker(handle, n, temperature, density, hydrogen, metals, status, buffer, &
       mu, beta, pressure, nabla_ad, cp, delta, phi, gamma1)
    type(c_ptr), intent(in) :: handle
    integer, intent(in) :: n
    real(c_double), intent(in), target :: temperature(n), density(n), hydrogen(n), metals(n)
    integer, intent(out) :: status
    character(kind=c_char), intent(out) :: buffer(MESSAGE_CAPACITY)
    real(c_double), intent(out), target, optional :: mu(n), beta(n), pressure(n), nabla_ad(n), cp(n), delta(n), &
         phi(n), gamma1(n)
    type(c_zones) :: zones
    type(c_thermo_out) :: out
    call no_zones(zones)
    zones%temperature = c_loc(temperature)
    zones%density = c_loc(density)
    zones%hydrogen = c_loc(hydrogen)
    zones%metals = c_loc(metals)
    out%mu = c_null_ptr
    out%beta = c_null_ptr
    out%pressure = c_null_ptr
    out%nabla_ad = c_null_ptr
    out%cp = c_null_ptr
    out%delta = c_null_ptr
    out%phi = c_null_ptr
    out%gamma1 = c_null_ptr
    if (present(mu)) out%mu = c_loc(mu)
    if (present(beta)) out%beta = c_loc(beta)
    if (present(pressure)) out%pressure = c_loc(pressure)
    if (present(nabla_ad)) out%nabla_ad = c_loc(nabla_ad)
    if (present(cp)) out%cp = c_loc(cp)
    if (present(delta)) out%delta = c_loc(delta)
    if (present(phi)) out%phi = c_loc(phi)
    if (present(gamma1)) out%gamma1 = c_loc(gamma1)
    status = c_thermodynamics(handle, int(n, c_int), zones, out, buffer, int(MESSAGE_CAPACITY, c_size_t))
  end subroutine thermodynamics_worker

  !> Opacity of size(temperature) zones: kappa (cm^2 g^-1) and its logarithmic derivatives.
  subroutine stt_opacity(model, temperature, density, hydrogen, metals, status, kappa, dlnkappa_dlnrho, &
       dlnkappa_dlnt, lookup, message)
    type(stt_model), intent(in) :: model
    real(c_double), intent(in) :: temperature(:), density(:), hydrogen(:), metals(:)
    integer, intent(out) :: status
    real(c_double), intent(out), optional :: kappa(:), dlnkappa_dlnrho(:), dlnkappa_dlnt(:)
    integer(c_int), intent(out), optional :: lookup(:)
    character(len=*), intent(out), optional :: message
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    integer :: n
    n = size(temperature)
    buffer(1) = c_null_char
    status = STT_OK
    call check(n, size(density), 'density', status, buffer)
    call check(n, size(hydrogen), 'hydrogen', status, buffer)
    call check(n, size(metals), 'metals', status, buffer)
    if (present(kappa)) call check(n, size(kappa), 'kappa', status, buffer)
    if (present(dlnkappa_dlnrho)) call check(n, size(dlnkappa_dlnrho), 'dlnkappa_dlnrho', status, buffer)
    if (present(dlnkappa_dlnt)) call check(n, size(dlnkappa_dlnt), 'dlnkappa_dlnt', status, buffer)
    if (present(lookup)) call check(n, size(lookup), 'lookup', status, buffer)
    if (status == STT_OK .and. n > 0) then
       call opacity_worker(model%handle, n, temperature, density, hydrogen, metals, status, buffer, kappa, &
            dlnkappa_dlnrho, dlnkappa_dlnt, lookup)
    end if
    if (present(message)) call from_c(buffer, message)
  end subroutine stt_opacity

  subroutine opacity_worker(handle, n, temperature, density, hydrogen, metals, status, buffer, kappa, &
       dlnkappa_dlnrho, dlnkappa_dlnt, lookup)
    type(c_ptr), intent(in) :: handle
    integer, intent(in) :: n
    real(c_double), intent(in), target :: temperature(n), density(n), hydrogen(n), metals(n)
    integer, intent(out) :: status
    character(kind=c_char), intent(out) :: buffer(MESSAGE_CAPACITY)
    real(c_double), intent(out), target, optional :: kappa(n), dlnkappa_dlnrho(n), dlnkappa_dlnt(n)
    integer(c_int), intent(out), target, optional :: lookup(n)
    type(c_zones) :: zones
    type(c_opacity_out) :: out
    call no_zones(zones)
    zones%temperature = c_loc(temperature)
    zones%density = c_loc(density)
    zones%hydrogen = c_loc(hydrogen)
    zones%metals = c_loc(metals)
    out%kappa = c_null_ptr
    out%dlnkappa_dlnrho = c_null_ptr
    out%dlnkappa_dlnt = c_null_ptr
    out%status = c_null_ptr
    if (present(kappa)) out%kappa = c_loc(kappa)
    if (present(dlnkappa_dlnrho)) out%dlnkappa_dlnrho = c_loc(dlnkappa_dlnrho)
    if (present(dlnkappa_dlnt)) out%dlnkappa_dlnt = c_loc(dlnkappa_dlnt)
    if (present(lookup)) out%status = c_loc(lookup)
    status = c_opacity(handle, int(n, c_int), zones, out, buffer, int(MESSAGE_CAPACITY, c_size_t))
  end subroutine opacity_worker

  !> Stability test of size(temperature) zones; jacobian(STT_INPUTS, 2, n) receives d nabla_rad and
  !> d nabla_L.
  subroutine stt_stability(model, mass, temperature, density, pressure, luminosity, opacity, nabla_ad, delta, &
       status, nabla_mu, phi, regime, nabla_rad, nabla_ledoux, margin_schwarzschild, margin_ledoux, jacobian, &
       message)
    type(stt_model), intent(in) :: model
    real(c_double), intent(in) :: mass(:), temperature(:), density(:), pressure(:), luminosity(:), opacity(:), &
         nabla_ad(:), delta(:)
    integer, intent(out) :: status
    real(c_double), intent(in), optional :: nabla_mu(:), phi(:)
    integer(c_int), intent(out), optional :: regime(:)
    real(c_double), intent(out), optional :: nabla_rad(:), nabla_ledoux(:), margin_schwarzschild(:), &
         margin_ledoux(:)
    real(c_double), intent(out), optional :: jacobian(:, :, :)
    character(len=*), intent(out), optional :: message
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    integer :: n
    n = size(temperature)
    buffer(1) = c_null_char
    status = STT_OK
    call check(n, size(mass), 'mass', status, buffer)
    call check(n, size(density), 'density', status, buffer)
    call check(n, size(pressure), 'pressure', status, buffer)
    call check(n, size(luminosity), 'luminosity', status, buffer)
    call check(n, size(opacity), 'opacity', status, buffer)
    call check(n, size(nabla_ad), 'nabla_ad', status, buffer)
    call check(n, size(delta), 'delta', status, buffer)
    if (present(nabla_mu)) call check(n, size(nabla_mu), 'nabla_mu', status, buffer)
    if (present(phi)) call check(n, size(phi), 'phi', status, buffer)
    if (present(regime)) call check(n, size(regime), 'regime', status, buffer)
    if (present(nabla_rad)) call check(n, size(nabla_rad), 'nabla_rad', status, buffer)
    if (present(nabla_ledoux)) call check(n, size(nabla_ledoux), 'nabla_ledoux', status, buffer)
    if (present(margin_schwarzschild)) call check(n, size(margin_schwarzschild), 'margin_schwarzschild', status, &
         buffer)
    if (present(margin_ledoux)) call check(n, size(margin_ledoux), 'margin_ledoux', status, buffer)
    if (present(jacobian)) call check_block(n, jacobian, STT_STABILITY_OUTPUTS, status, buffer)
    if (status == STT_OK .and. n > 0) then
       call stability_worker(model%handle, n, mass, temperature, density, pressure, luminosity, opacity, &
            nabla_ad, delta, status, buffer, nabla_mu, phi, regime, nabla_rad, nabla_ledoux, &
            margin_schwarzschild, margin_ledoux, jacobian)
    end if
    if (present(message)) call from_c(buffer, message)
  end subroutine stt_stability

  subroutine stability_worker(handle, n, mass, temperature, density, pressure, luminosity, opacity, nabla_ad, &
       delta, status, buffer, nabla_mu, phi, regime, nabla_rad, nabla_ledoux, margin_schwarzschild, &
       margin_ledoux, jacobian)
    type(c_ptr), intent(in) :: handle
    integer, intent(in) :: n
    real(c_double), intent(in), target :: mass(n), temperature(n), density(n), pressure(n), luminosity(n), &
         opacity(n), nabla_ad(n), delta(n)
    integer, intent(out) :: status
    character(kind=c_char), intent(out) :: buffer(MESSAGE_CAPACITY)
    real(c_double), intent(in), target, optional :: nabla_mu(n), phi(n)
    integer(c_int), intent(out), target, optional :: regime(n)
    real(c_double), intent(out), target, optional :: nabla_rad(n), nabla_ledoux(n), margin_schwarzschild(n), &
         margin_ledoux(n)
    real(c_double), intent(out), target, optional :: jacobian(STT_INPUTS, STT_STABILITY_OUTPUTS, n)
    type(c_zones) :: zones
    type(c_stability_out) :: out
    type(c_ptr) :: block
    call no_zones(zones)
    zones%mass = c_loc(mass)
    zones%temperature = c_loc(temperature)
    zones%density = c_loc(density)
    zones%pressure = c_loc(pressure)
    zones%luminosity = c_loc(luminosity)
    zones%opacity = c_loc(opacity)
    zones%nabla_ad = c_loc(nabla_ad)
    zones%delta = c_loc(delta)
    if (present(nabla_mu)) zones%nabla_mu = c_loc(nabla_mu)
    if (present(phi)) zones%phi = c_loc(phi)
    out%regime = c_null_ptr
    out%nabla_rad = c_null_ptr
    out%nabla_ad = c_null_ptr
    out%nabla_ledoux = c_null_ptr
    out%margin_schwarzschild = c_null_ptr
    out%margin_ledoux = c_null_ptr
    if (present(regime)) out%regime = c_loc(regime)
    if (present(nabla_rad)) out%nabla_rad = c_loc(nabla_rad)
    if (present(nabla_ledoux)) out%nabla_ledoux = c_loc(nabla_ledoux)
    if (present(margin_schwarzschild)) out%margin_schwarzschild = c_loc(margin_schwarzschild)
    if (present(margin_ledoux)) out%margin_ledoux = c_loc(margin_ledoux)
    block = c_null_ptr
    if (present(jacobian)) block = c_loc(jacobian)
    status = c_stability(handle, int(n, c_int), zones, out, block, buffer, int(MESSAGE_CAPACITY, c_size_t))
  end subroutine stability_worker

  !> Convection of size(temperature) zones: values, and with jacobian(STT_INPUTS, 4, n) the partial
  !> derivatives of nabla, v_conv, F_conv/F and D with respect to every input.
  subroutine stt_convection(model, radius, mass, temperature, density, pressure, luminosity, opacity, cp, &
       nabla_ad, delta, status, nabla_mu, phi, regime, nabla_rad, nabla, nabla_element, velocity, &
       convective_fraction, radiative_fraction, efficiency, loss_parameter, scale_height, mixing_length, &
       diffusion, jacobian, message)
    type(stt_model), intent(in) :: model
    real(c_double), intent(in) :: radius(:), mass(:), temperature(:), density(:), pressure(:), luminosity(:), &
         opacity(:), cp(:), nabla_ad(:), delta(:)
    integer, intent(out) :: status
    real(c_double), intent(in), optional :: nabla_mu(:), phi(:)
    integer(c_int), intent(out), optional :: regime(:)
    real(c_double), intent(out), optional :: nabla_rad(:), nabla(:), nabla_element(:), velocity(:), &
         convective_fraction(:), radiative_fraction(:), efficiency(:), loss_parameter(:), scale_height(:), &
         mixing_length(:), diffusion(:)
    real(c_double), intent(out), optional :: jacobian(:, :, :)
    character(len=*), intent(out), optional :: message
    character(kind=c_char) :: buffer(MESSAGE_CAPACITY)
    integer :: n
    n = size(temperature)
    buffer(1) = c_null_char
    status = STT_OK
    call check(n, size(radius), 'radius', status, buffer)
    call check(n, size(mass), 'mass', status, buffer)
    call check(n, size(density), 'density', status, buffer)
    call check(n, size(pressure), 'pressure', status, buffer)
    call check(n, size(luminosity), 'luminosity', status, buffer)
    call check(n, size(opacity), 'opacity', status, buffer)
    call check(n, size(cp), 'cp', status, buffer)
    call check(n, size(nabla_ad), 'nabla_ad', status, buffer)
    call check(n, size(delta), 'delta', status, buffer)
    if (present(nabla_mu)) call check(n, size(nabla_mu), 'nabla_mu', status, buffer)
    if (present(phi)) call check(n, size(phi), 'phi', status, buffer)
    if (present(regime)) call check(n, size(regime), 'regime', status, buffer)
    if (present(nabla_rad)) call check(n, size(nabla_rad), 'nabla_rad', status, buffer)
    if (present(nabla)) call check(n, size(nabla), 'nabla', status, buffer)
    if (present(nabla_element)) call check(n, size(nabla_element), 'nabla_element', status, buffer)
    if (present(velocity)) call check(n, size(velocity), 'velocity', status, buffer)
    if (present(convective_fraction)) call check(n, size(convective_fraction), 'convective_fraction', status, &
         buffer)
    if (present(radiative_fraction)) call check(n, size(radiative_fraction), 'radiative_fraction', status, buffer)
    if (present(efficiency)) call check(n, size(efficiency), 'efficiency', status, buffer)
    if (present(loss_parameter)) call check(n, size(loss_parameter), 'loss_parameter', status, buffer)
    if (present(scale_height)) call check(n, size(scale_height), 'scale_height', status, buffer)
    if (present(mixing_length)) call check(n, size(mixing_length), 'mixing_length', status, buffer)
    if (present(diffusion)) call check(n, size(diffusion), 'diffusion', status, buffer)
    if (present(jacobian)) call check_block(n, jacobian, STT_CONVECTION_OUTPUTS, status, buffer)
    if (status == STT_OK .and. n > 0) then
       call convection_worker(model%handle, n, radius, mass, temperature, density, pressure, luminosity, opacity, &
            cp, nabla_ad, delta, status, buffer, nabla_mu, phi, regime, nabla_rad, nabla, nabla_element, &
            velocity, convective_fraction, radiative_fraction, efficiency, loss_parameter, scale_height, &
            mixing_length, diffusion, jacobian)
    end if
    if (present(message)) call from_c(buffer, message)
  end subroutine stt_convection

  subroutine convection_worker(handle, n, radius, mass, temperature, density, pressure, luminosity, opacity, cp, &
       nabla_ad, delta, status, buffer, nabla_mu, phi, regime, nabla_rad, nabla, nabla_element, velocity, &
       convective_fraction, radiative_fraction, efficiency, loss_parameter, scale_height, mixing_length, &
       diffusion, jacobian)
    type(c_ptr), intent(in) :: handle
    integer, intent(in) :: n
    real(c_double), intent(in), target :: radius(n), mass(n), temperature(n), density(n), pressure(n), &
         luminosity(n), opacity(n), cp(n), nabla_ad(n), delta(n)
    integer, intent(out) :: status
    character(kind=c_char), intent(out) :: buffer(MESSAGE_CAPACITY)
    real(c_double), intent(in), target, optional :: nabla_mu(n), phi(n)
    integer(c_int), intent(out), target, optional :: regime(n)
    real(c_double), intent(out), target, optional :: nabla_rad(n), nabla(n), nabla_element(n), velocity(n), &
         convective_fraction(n), radiative_fraction(n), efficiency(n), loss_parameter(n), scale_height(n), &
         mixing_length(n), diffusion(n)
    real(c_double), intent(out), target, optional :: jacobian(STT_INPUTS, STT_CONVECTION_OUTPUTS, n)
    type(c_zones) :: zones
    type(c_convection_out) :: out
    type(c_ptr) :: block
    call no_zones(zones)
    zones%radius = c_loc(radius)
    zones%mass = c_loc(mass)
    zones%temperature = c_loc(temperature)
    zones%density = c_loc(density)
    zones%pressure = c_loc(pressure)
    zones%luminosity = c_loc(luminosity)
    zones%opacity = c_loc(opacity)
    zones%cp = c_loc(cp)
    zones%nabla_ad = c_loc(nabla_ad)
    zones%delta = c_loc(delta)
    if (present(nabla_mu)) zones%nabla_mu = c_loc(nabla_mu)
    if (present(phi)) zones%phi = c_loc(phi)
    out%regime = c_null_ptr
    out%nabla_rad = c_null_ptr
    out%nabla = c_null_ptr
    out%nabla_element = c_null_ptr
    out%velocity = c_null_ptr
    out%convective_fraction = c_null_ptr
    out%radiative_fraction = c_null_ptr
    out%efficiency = c_null_ptr
    out%loss_parameter = c_null_ptr
    out%scale_height = c_null_ptr
    out%mixing_length = c_null_ptr
    out%diffusion = c_null_ptr
    if (present(regime)) out%regime = c_loc(regime)
    if (present(nabla_rad)) out%nabla_rad = c_loc(nabla_rad)
    if (present(nabla)) out%nabla = c_loc(nabla)
    if (present(nabla_element)) out%nabla_element = c_loc(nabla_element)
    if (present(velocity)) out%velocity = c_loc(velocity)
    if (present(convective_fraction)) out%convective_fraction = c_loc(convective_fraction)
    if (present(radiative_fraction)) out%radiative_fraction = c_loc(radiative_fraction)
    if (present(efficiency)) out%efficiency = c_loc(efficiency)
    if (present(loss_parameter)) out%loss_parameter = c_loc(loss_parameter)
    if (present(scale_height)) out%scale_height = c_loc(scale_height)
    if (present(mixing_length)) out%mixing_length = c_loc(mixing_length)
    if (present(diffusion)) out%diffusion = c_loc(diffusion)
    block = c_null_ptr
    if (present(jacobian)) block = c_loc(jacobian)
    status = c_convection(handle, int(n, c_int), zones, out, block, buffer, int(MESSAGE_CAPACITY, c_size_t))
  end subroutine convection_worker

  ! ---- helpers --------------------------------------------------------------------------------

  !> A NUL-terminated copy of an optional string (blank or absent: the empty string).
  function c_text(text) result(chars)
    character(len=*), intent(in), optional :: text
    character(kind=c_char, len=:), allocatable :: chars
    if (present(text)) then
       chars = trim(text) // c_null_char
    else
       chars = c_null_char
    end if
  end function c_text

  !> Copies a NUL-terminated C message into a blank-padded Fortran string.
  subroutine from_c(buffer, text)
    character(kind=c_char), intent(in) :: buffer(:)
    character(len=*), intent(out) :: text
    integer :: i
    text = ' '
    do i = 1, min(size(buffer), len(text))
       if (buffer(i) == c_null_char) exit
       text(i:i) = buffer(i)
    end do
  end subroutine from_c

  !> Writes a Fortran message into the C buffer.
  subroutine to_c(text, buffer)
    character(len=*), intent(in) :: text
    character(kind=c_char), intent(out) :: buffer(:)
    integer :: i, n
    n = min(len_trim(text), size(buffer) - 1)
    do i = 1, n
       buffer(i) = text(i:i)
    end do
    buffer(n + 1) = c_null_char
  end subroutine to_c

  !> Refuses an array shorter than the zone count (the first such array is reported).
  subroutine check(n, length, name, status, buffer)
    integer, intent(in) :: n, length
    character(len=*), intent(in) :: name
    integer, intent(inout) :: status
    character(kind=c_char), intent(inout) :: buffer(:)
    character(len=200) :: text
    if (status /= STT_OK .or. length >= n) return
    write (text, '(a, a, i0, a, i0, a)') name, ' holds ', length, ' values but size(temperature) = ', n, &
         ' zones: every array of a call holds at least size(temperature) values'
    call to_c(text, buffer)
    status = STT_BAD_ARGUMENT
  end subroutine check

  !> Refuses a Jacobian that is not (STT_INPUTS, outputs, >= n).
  subroutine check_block(n, jacobian, outputs, status, buffer)
    integer, intent(in) :: n, outputs
    real(c_double), intent(in) :: jacobian(:, :, :)
    integer, intent(inout) :: status
    character(kind=c_char), intent(inout) :: buffer(:)
    character(len=200) :: text
    if (status /= STT_OK) return
    if (size(jacobian, 1) == STT_INPUTS .and. size(jacobian, 2) == outputs .and. size(jacobian, 3) >= n) return
    write (text, '(a, 3(i0, a), i0, a, i0, a)') 'jacobian has shape (', size(jacobian, 1), ', ', &
         size(jacobian, 2), ', ', size(jacobian, 3), '): must be (', STT_INPUTS, ', ', outputs, ', n) or longer'
    call to_c(text, buffer)
    status = STT_BAD_ARGUMENT
  end subroutine check_block

  subroutine no_zones(zones)
    type(c_zones), intent(out) :: zones
    zones%radius = c_null_ptr
    zones%mass = c_null_ptr
    zones%temperature = c_null_ptr
    zones%density = c_null_ptr
    zones%pressure = c_null_ptr
    zones%luminosity = c_null_ptr
    zones%opacity = c_null_ptr
    zones%cp = c_null_ptr
    zones%nabla_ad = c_null_ptr
    zones%delta = c_null_ptr
    zones%nabla_mu = c_null_ptr
    zones%phi = c_null_ptr
    zones%hydrogen = c_null_ptr
    zones%metals = c_null_ptr
  end subroutine no_zones

end module startransport
