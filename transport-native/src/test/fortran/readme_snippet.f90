!> The README's Fortran snippet (between the snippet markers, which the README check keeps equal
!> to the README's block), run on the three invented zones of readme_snippet.c (demo numbers, not a
!> star). Prints, per zone, "zone K v=V dv_dkappa=D", which NativeFortranTest compares with the
!> Java API.
program readme_snippet
  implicit none
  integer, parameter :: n = 3
  real(8) :: r(n) = [5d10, 5d10, 5d10], m(n) = [1d33, 1d33, 1d33], t(n) = [1d6, 1d6, 2d6]
  real(8) :: rho(n) = [0.1d0, 0.1d0, 0.2d0], p(n) = [1.4d13, 1.4d13, 5.6d13]
  real(8) :: lum(n) = [3.8d33, 3.8d32, 7.6d33], kappa(n) = [10d0, 10d0, 5d0], cp(n) = [3d8, 3d8, 3d8]
  real(8) :: nabla_ad(n) = [0.4d0, 0.4d0, 0.4d0], delta(n) = [1d0, 1d0, 1d0], nabla(n), v(n)
  integer :: k
  call snippet()
contains
  subroutine snippet()
    ! snippet-start: native-fortran
    use startransport
    type(stt_session) :: session
    type(stt_model) :: mlt
    real(8), allocatable :: jac(:, :, :)
    character(len=1024) :: msg
    integer :: status
    call stt_open(session, status, message=msg)                        ! zones numbered from 1
    call stt_model_create(session, 'convection', 'local-mixing-length', mlt, status, &
         options='alpha=1.8,criterion=ledoux', message=msg)
    allocate (jac(STT_INPUTS, STT_CONVECTION_OUTPUTS, n))
    call stt_convection(mlt, r, m, t, rho, p, lum, kappa, cp, nabla_ad, delta, status, &
         nabla=nabla, velocity=v, jacobian=jac, message=msg)           ! jac(STT_KAPPA, STT_D_VELOCITY, k)
    if (status /= STT_OK) print '(a)', trim(msg)
    ! snippet-end: native-fortran
    do k = 1, n
       write (*, '(a, i0, a, es25.17e3, a, es25.17e3)') 'zone ', k - 1, ' v=', v(k), ' dv_dkappa=', &
            jac(STT_KAPPA, STT_D_VELOCITY, k)
    end do
  end subroutine snippet
end program readme_snippet
